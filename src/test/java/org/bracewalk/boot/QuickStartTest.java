package org.bracewalk.boot;


import static org.assertj.core.api.Assertions.assertThat;

import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.attribute.FileTime;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** When the app is opened in a second process that maps an archive of its classes, and how. */
class QuickStartTest {
  @TempDir Path dir;

  private Path jar() throws Exception {
    Path jar = dir.resolve("bracewalk.jar");
    if (!Files.exists(jar)) {
      Files.write(jar, new byte[] {'P', 'K', 3, 4});
    }
    return jar;
  }

  private QuickStart.Here here(String classPath, List<String> options, Map<String, String> env, boolean hotSpot,
      boolean child) {
    return new QuickStart.Here(Optional.of("/opt/jdk/bin/java"), classPath, options, env, "Linux", dir.resolve("home"),
        "/opt/jdk 17.0.15+6", hotSpot, child);
  }

  private QuickStart.Here linux(List<String> options) throws Exception {
    return here(jar().toString(), options, Map.of("XDG_CACHE_HOME", dir.resolve("cache").toString()), true, false);
  }

  @Test
  void theFirstRunWritesTheArchiveAndTheNextMapsIt() throws Exception {
    var first = QuickStart.plan(linux(List.of("-Xmx1g")), "org.bracewalk.boot.Main", List.of("--db", "site.db"));
    assertThat(first).isPresent();
    Path archive = first.get().archive();
    assertThat(archive.getParent()).isEqualTo(dir.resolve("cache").resolve("bracewalk"));
    assertThat(archive.getFileName().toString()).matches("classes-main-[0-9a-f]{16}\\.jsa");
    Path part = first.get().writing().orElseThrow();
    List<String> c = first.get().command();
    assertThat(c.get(0)).isEqualTo("/opt/jdk/bin/java");
    assertThat(c).contains("-Xmx1g", "-XX:ArchiveClassesAtExit=" + part, "-D" + QuickStart.CHILD_PROPERTY + "=1");
    assertThat(c.subList(c.indexOf("-cp"), c.size()))
        .containsExactly("-cp", jar().toAbsolutePath().toString(), "org.bracewalk.boot.Main", "--db", "site.db");
    // the session ends: the archive it wrote is put in place, older archives dropped
    Path older = Files.writeString(archive.resolveSibling("classes-main-00000000000000aa.jsa"), "old");
    Path benchs = Files.writeString(archive.resolveSibling("classes-startupbench-00000000000000ab.jsa"), "bench");
    Files.writeString(part, "archive bytes");
    Path killedLongAgo = Files.writeString(archive.resolveSibling("classes-main-00000000000000bb.jsa.99.part"), "half");
    Files.setLastModifiedTime(killedLongAgo, FileTime.from(java.time.Instant.now().minus(java.time.Duration.ofDays(3))));
    Path killedJustNow = Files.writeString(archive.resolveSibling("classes-main-00000000000000cc.jsa.98.part"), "half");
    older.toFile().setReadOnly(); // as the JDK writes them
    QuickStart.keep(first.get(), 0);
    assertThat(archive).exists();
    assertThat(part).doesNotExist();
    assertThat(older).doesNotExist();
    assertThat(benchs).as("the benchmark's own archive is not the app's to drop").exists();
    assertThat(killedLongAgo).doesNotExist();
    assertThat(killedJustNow).as("another session may still be writing it").exists();
    var next = QuickStart.plan(linux(List.of()), "org.bracewalk.boot.Main", List.of());
    assertThat(next.get().writing()).isEmpty();
    assertThat(next.get().command()).contains("-XX:SharedArchiveFile=" + archive)
        .noneMatch(o -> o.startsWith("-XX:ArchiveClassesAtExit"));
  }

  @Test
  void aHalfWrittenArchiveOrOneOfAFailedSessionIsClearedAway() throws Exception {
    var plan = QuickStart.plan(linux(List.of()), "org.bracewalk.boot.Main", List.of()).orElseThrow();
    Path part = plan.writing().orElseThrow();
    Files.write(part, new byte[0]);
    QuickStart.keep(plan, 0);
    assertThat(part).doesNotExist();
    assertThat(plan.archive()).doesNotExist();
    // a session that ended in failure (no display: exit 2) loaded too little to keep
    Files.writeString(part, "archive of a session that never drew a window");
    QuickStart.keep(plan, 2);
    assertThat(part).doesNotExist();
    assertThat(plan.archive()).doesNotExist();
  }

  @Test
  void theBenchmarkAndTheAppKeepArchivesOfTheirOwn() throws Exception {
    var app = QuickStart.plan(linux(List.of()), "org.bracewalk.boot.Main", List.of()).orElseThrow();
    var bench = QuickStart.plan(linux(List.of()), "org.bracewalk.boot.StartupBench", List.of()).orElseThrow();
    assertThat(app.archive()).isNotEqualTo(bench.archive());
  }

  @Test
  void aNewBuildOfTheJarGetsANewArchive() throws Exception {
    String main = "org.bracewalk.boot.Main";
    String before = QuickStart.archiveName(jar(), "/opt/jdk 17.0.15+6", main);
    Files.setLastModifiedTime(jar(), FileTime.fromMillis(Files.getLastModifiedTime(jar()).toMillis() + 60_000));
    assertThat(QuickStart.archiveName(jar(), "/opt/jdk 17.0.15+6", main)).isNotEqualTo(before);
    assertThat(QuickStart.archiveName(jar(), "/opt/jdk 21.0.5+11", main))
        .isNotEqualTo(QuickStart.archiveName(jar(), "/opt/jdk 17.0.15+6", main));
  }

  @Test
  void itStandsAsideWhereItCouldGetInTheWay() throws Exception {
    String cp = jar().toString();
    Map<String, String> env = Map.of("XDG_CACHE_HOME", dir.resolve("cache").toString());
    String main = "org.bracewalk.boot.Main";
    // already the second process; turned off; not HotSpot; not one jar; a debugger or agent attached
    assertThat(QuickStart.plan(here(cp, List.of(), env, true, true), main, List.of())).isEmpty();
    assertThat(QuickStart.plan(here(cp, List.of(), Map.of(QuickStart.VARIABLE, "0"), true, false), main, List.of()))
        .isEmpty();
    assertThat(QuickStart.plan(here(cp, List.of(), env, false, false), main, List.of())).isEmpty();
    assertThat(QuickStart.plan(here(cp + java.io.File.pathSeparator + "other.jar", List.of(), env, true, false), main,
        List.of())).isEmpty();
    assertThat(QuickStart.plan(here(dir.resolve("classes").toString(), List.of(), env, true, false), main, List.of()))
        .isEmpty();
    for (String o : List.of("-agentlib:jdwp=transport=dt_socket", "-javaagent:x.jar", "-Xshare:off",
        "-XX:SharedArchiveFile=mine.jsa")) {
      assertThat(QuickStart.plan(here(cp, List.of(o), env, true, false), main, List.of())).as(o).isEmpty();
    }
    assertThat(QuickStart.plan(here(cp, List.of("-Xmx2g"), env, true, false), main, List.of())).isPresent();
  }

  @Test
  void theArchiveLivesInEachSystemsCacheFolder() throws Exception {
    Path home = dir.resolve("home");
    var mac = new QuickStart.Here(Optional.of("java"), "", List.of(), Map.of(), "Mac OS X", home, "", true, false);
    assertThat(QuickStart.cacheFolder(mac)).isEqualTo(home.resolve("Library/Caches/Bracewalk"));
    var win = new QuickStart.Here(Optional.of("java"), "", List.of(), Map.of("LOCALAPPDATA", dir.resolve("local").toString()),
        "Windows 11", home, "", true, false);
    assertThat(QuickStart.cacheFolder(win)).isEqualTo(dir.resolve("local").resolve("Bracewalk").resolve("Cache"));
    var linux = new QuickStart.Here(Optional.of("java"), "", List.of(), Map.of(), "Linux", home, "", true, false);
    assertThat(QuickStart.cacheFolder(linux)).isEqualTo(home.resolve(".cache/bracewalk"));
    assertThat(QuickStart.isHotSpot("OpenJDK 64-Bit Server VM")).isTrue();
    assertThat(QuickStart.isHotSpot("Java HotSpot(TM) 64-Bit Server VM")).isTrue();
    assertThat(QuickStart.isHotSpot("Eclipse OpenJ9 VM")).isFalse();
  }
}
