package org.bracewalk.boot;

import java.io.IOException;
import java.io.PrintWriter;
import java.lang.management.ManagementFactory;
import java.nio.charset.StandardCharsets;
import java.nio.file.DirectoryStream;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.StandardCopyOption;
import java.security.MessageDigest;
import java.security.NoSuchAlgorithmException;
import java.util.ArrayList;
import java.util.HexFormat;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Optional;
import java.util.OptionalInt;

/**
 * Opens the desktop app in a second Java process that maps the program's classes from a class
 * data archive (the JDK's application class-data sharing: {@code -XX:ArchiveClassesAtExit} writes
 * the archive when a session ends, {@code -XX:SharedArchiveFile} maps it in the next). Loading and
 * checking some five thousand classes is most of a cold start; from the archive the window is up
 * in about two thirds of the time. {@code java -jar} cannot pass JVM options itself, so the first
 * process only starts the second, waits for it and passes on its exit status.
 *
 * <p>Used only where it cannot get in the way: the program runs from one jar file on HotSpot 13 or
 * later, no class data or agent options were given (a debugger stays attached to the process it
 * started), and {@code BRACEWALK_QUICK_START} is not {@code 0}. The archive lives in the user's
 * cache folder, named by the jar, the Java runtime and the main class, so a new build or a new
 * JDK writes a new one; the session that writes it is slower than one process (two JVMs start,
 * and the archive is written as it ends), and it is kept only when that session ended with
 * status 0. When the second process cannot be started the app runs in this one; a second process
 * that starts and then fails passes its exit status on.
 */
final class QuickStart {
  /** Set to 0 to always run in the first process. */
  static final String VARIABLE = "BRACEWALK_QUICK_START";

  /** Set in the second process, so it never starts a third. */
  static final String CHILD_PROPERTY = "bracewalk.quickstart.child";

  private QuickStart() {}

  /**
   * The second process: its command line, the archive it maps (when present) and the file it
   * writes its archive to (when there is none yet).
   */
  record Plan(List<String> command, Path archive, Optional<Path> writing) {}

  /** What decides the plan, as read from this process (tests give their own). */
  record Here(
      Optional<String> javaCommand,
      String classPath,
      List<String> jvmOptions,
      Map<String, String> env,
      String osName,
      Path userHome,
      String runtime,
      boolean hotSpot,
      boolean child) {
    static Here current(Map<String, String> env) {
      return new Here(
          ProcessHandle.current().info().command(),
          System.getProperty("java.class.path", ""),
          ManagementFactory.getRuntimeMXBean().getInputArguments(),
          env,
          System.getProperty("os.name", ""),
          Path.of(System.getProperty("user.home", ".")),
          System.getProperty("java.home", "") + " " + System.getProperty("java.vm.version", ""),
          // the options used are HotSpot's (class data archives written at exit: JDK 13 and later)
          isHotSpot(System.getProperty("java.vm.name", "")) && Runtime.version().feature() >= 13,
          System.getProperty(CHILD_PROPERTY) != null);
    }
  }

  /** HotSpot by its name: Oracle's ("Java HotSpot") and the OpenJDK builds ("OpenJDK ... VM"). */
  static boolean isHotSpot(String vmName) {
    return (vmName.contains("HotSpot") || vmName.startsWith("OpenJDK")) && !vmName.contains("J9");
  }

  /** The second process for {@code mainClass args}, or empty when this process should run it. */
  static Optional<Plan> plan(Here here, String mainClass, List<String> args) {
    if (here.child() || !here.hotSpot() || "0".equals(here.env().get(VARIABLE)) || here.javaCommand().isEmpty()) {
      return Optional.empty();
    }
    String cp = here.classPath();
    if (cp.isEmpty() || cp.contains(java.io.File.pathSeparator) || !cp.toLowerCase(Locale.ROOT).endsWith(".jar")) {
      return Optional.empty(); // an archive maps classes from jar files only
    }
    for (String o : here.jvmOptions()) {
      if (o.startsWith("-XX:SharedArchiveFile") || o.startsWith("-XX:ArchiveClassesAtExit")
          || o.startsWith("-Xshare") || o.startsWith("-agentlib") || o.startsWith("-javaagent")
          || o.startsWith("-agentpath") || o.startsWith("-Xdebug") || o.startsWith("-Xrunjdwp")) {
        return Optional.empty();
      }
    }
    Path jar = Path.of(cp).toAbsolutePath();
    Path archive;
    try {
      // the main class is part of the name: a headless benchmark's classes are not the app's
      archive = cacheFolder(here).resolve(archiveName(jar, here.runtime(), mainClass));
    } catch (IOException e) {
      return Optional.empty();
    }
    List<String> command = new ArrayList<>();
    command.add(here.javaCommand().get());
    command.addAll(here.jvmOptions());
    Optional<Path> writing;
    if (Files.isRegularFile(archive)) {
      command.add("-XX:SharedArchiveFile=" + archive);
      writing = Optional.empty();
    } else {
      Path temp = archive.resolveSibling(archive.getFileName() + "." + ProcessHandle.current().pid() + ".part");
      command.add("-XX:ArchiveClassesAtExit=" + temp);
      writing = Optional.of(temp);
    }
    // the archive's own notes (classes it skips, a stale archive) are not the inspector's concern
    command.add("-Xlog:cds=off");
    command.add("-Xlog:cds+dynamic=off");
    command.add("-D" + CHILD_PROPERTY + "=1");
    command.add("-cp");
    command.add(jar.toString());
    command.add(mainClass);
    command.addAll(args);
    return Optional.of(new Plan(List.copyOf(command), archive, writing));
  }

  /**
   * The archive's file name: {@code classes-MAIN-HASH.jsa}, the main class's simple name and a
   * hash of the jar (path, size, time) and the runtime.
   */
  static String archiveName(Path jar, String runtime, String mainClass) throws IOException {
    String key = jar + "\n" + Files.size(jar) + "\n" + Files.getLastModifiedTime(jar).toMillis() + "\n" + runtime;
    String main = mainClass.substring(mainClass.lastIndexOf('.') + 1).toLowerCase(Locale.ROOT);
    try {
      byte[] h = MessageDigest.getInstance("SHA-256").digest(key.getBytes(StandardCharsets.UTF_8));
      return "classes-" + main + "-" + HexFormat.of().formatHex(h, 0, 8) + ".jsa";
    } catch (NoSuchAlgorithmException e) {
      throw new IllegalStateException(e);
    }
  }

  /**
   * The per-user cache folder: {@code $XDG_CACHE_HOME/bracewalk} or {@code ~/.cache/bracewalk} on
   * Linux, {@code ~/Library/Caches/Bracewalk} on macOS, {@code %LOCALAPPDATA%\Bracewalk\Cache} on
   * Windows.
   */
  static Path cacheFolder(Here here) throws IOException {
    String os = here.osName().toLowerCase(Locale.ROOT);
    Path folder;
    if (os.startsWith("windows")) {
      String local = here.env().get("LOCALAPPDATA");
      Path base = local != null && !local.isBlank() ? Path.of(local) : here.userHome().resolve("AppData").resolve("Local");
      folder = base.resolve("Bracewalk").resolve("Cache");
    } else if (os.startsWith("mac")) {
      folder = here.userHome().resolve("Library").resolve("Caches").resolve("Bracewalk");
    } else {
      String xdg = here.env().get("XDG_CACHE_HOME");
      Path base = xdg != null && !xdg.isBlank() && Path.of(xdg).isAbsolute() ? Path.of(xdg) : here.userHome().resolve(".cache");
      folder = base.resolve("bracewalk");
    }
    return Files.createDirectories(folder);
  }

  /**
   * Runs the app in a second process when that is useful and possible, and returns its exit
   * status; empty when this process should run the app itself.
   */
  static OptionalInt runApp(String[] args, Map<String, String> env, PrintWriter err) {
    Optional<Plan> plan = plan(Here.current(env), Main.class.getName(), List.of(args));
    if (plan.isEmpty()) {
      return OptionalInt.empty();
    }
    Process child;
    try {
      child = new ProcessBuilder(plan.get().command()).inheritIO().start();
    } catch (IOException | RuntimeException e) {
      return OptionalInt.empty();
    }
    Thread stop = new Thread(child::destroy, "bracewalk-stop-app");
    Runtime.getRuntime().addShutdownHook(stop);
    int code;
    try {
      code = child.waitFor();
    } catch (InterruptedException e) {
      Thread.currentThread().interrupt();
      child.destroy();
      return OptionalInt.of(130);
    }
    try {
      Runtime.getRuntime().removeShutdownHook(stop);
    } catch (IllegalStateException shuttingDown) {
      // the JVM is already on its way out
    }
    keep(plan.get(), code);
    return OptionalInt.of(code);
  }

  /**
   * After the second process ended with {@code exitStatus}: puts a newly written archive in place
   * when that session ended normally (status 0; a session that failed, say with no display, loaded
   * too little to be worth mapping), and clears away what is left over: the half-written file,
   * older archives, and half-written files of sessions killed more than a day ago.
   */
  static void keep(Plan plan, int exitStatus) {
    Path folder = plan.archive().getParent();
    if (plan.writing().isPresent()) {
      Path temp = plan.writing().get();
      try {
        if (exitStatus == 0 && Files.isRegularFile(temp) && Files.size(temp) > 0) {
          Files.move(temp, plan.archive(), StandardCopyOption.REPLACE_EXISTING, StandardCopyOption.ATOMIC_MOVE);
        }
      } catch (IOException e) {
        // a cache file: the next start tries again
      }
      delete(temp);
    }
    java.time.Instant dayAgo = java.time.Instant.now().minus(java.time.Duration.ofDays(1));
    String name = plan.archive().getFileName().toString();
    String family = name.substring(0, name.lastIndexOf('-') + 1); // classes-main-
    try (DirectoryStream<Path> files = Files.newDirectoryStream(folder, "classes-*")) {
      for (Path p : files) {
        String n = p.getFileName().toString();
        // (classes-HASH.jsa: the name before the main class was part of it)
        boolean olderArchive = (n.startsWith(family) || n.matches("classes-[0-9a-f]{16}\\.jsa"))
            && n.endsWith(".jsa") && !p.equals(plan.archive()) && Files.exists(plan.archive());
        boolean staleHalf = n.endsWith(".part") && !plan.writing().map(p::equals).orElse(false)
            && Files.getLastModifiedTime(p).toInstant().isBefore(dayAgo);
        if (olderArchive || staleHalf) {
          delete(p);
        }
      }
    } catch (IOException e) {
      // nothing to tidy, or not now
    }
  }

  /** Deletes a cache file; the JDK writes archives read-only, which Windows will not delete. */
  private static void delete(Path p) {
    try {
      p.toFile().setWritable(true);
      Files.deleteIfExists(p);
    } catch (IOException | SecurityException e) {
      // left for the next start
    }
  }
}
