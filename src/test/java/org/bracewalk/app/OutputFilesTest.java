package org.bracewalk.app;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.Optional;
import java.util.stream.Stream;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * The one writer of output files: it never writes over the database, its companion files, a file
 * the run reads, or through a link, and a failed write leaves the old file as it was.
 */
class OutputFilesTest {
  @TempDir Path dir;

  private Path db;
  private static final byte[] RECORDS = "the records, as they were".getBytes(StandardCharsets.UTF_8);

  @BeforeEach
  void aDatabase() throws IOException {
    db = dir.resolve("site.db");
    Files.write(db, RECORDS);
  }

  private OutputFiles outputs() {
    return OutputFiles.guarding(Optional.of(db));
  }

  private void refused(OutputFiles o, Path target, String... words) {
    assertThatThrownBy(() -> o.writeText(target, "a report"))
        .as(target.toString())
        .isInstanceOf(UserInputException.class)
        .hasMessageContaining(target.toString())
        .hasMessageContaining("Nothing was written");
    for (String w : words) {
      assertThatThrownBy(() -> o.writeText(target, "a report")).hasMessageContaining(w);
    }
  }

  private List<String> listing() throws IOException {
    try (Stream<Path> s = Files.list(dir)) {
      return s.map(p -> p.getFileName().toString()).sorted().toList();
    }
  }

  @Test
  void theDatabaseAndItsCompanionFilesAreRefusedUnderAnySpelling() throws Exception {
    List<String> before = listing();
    refused(outputs(), db, "the open database");
    refused(outputs(), Path.of(db + "-wal"), "write-ahead log");
    refused(outputs(), Path.of(db + "-shm"), "shared-memory");
    refused(outputs(), Path.of(db + "-journal"), "rollback journal");
    // a name differing only in case: on a case-blind disk it is the journal SQLite would read
    refused(outputs(), dir.resolve("SITE.DB-JOURNAL"), "rollback journal");
    refused(outputs(), dir.resolve("sub").resolve("..").resolve("site.db"), "the open database");
    Files.createDirectories(dir.resolve("sub"));
    refused(outputs(), dir.resolve("sub/../site.db"), "the open database");
    // a folder reached through a link, and a hard link: the same file
    Files.createSymbolicLink(dir.resolve("linked-folder"), dir);
    refused(outputs(), dir.resolve("linked-folder/site.db"), "the open database");
    Files.createLink(dir.resolve("hard.db"), db);
    refused(outputs(), dir.resolve("hard.db"), "the open database");
    assertThat(Files.readAllBytes(db)).isEqualTo(RECORDS);
    assertThat(listing()).containsExactlyInAnyOrderElementsOf(
        Stream.concat(before.stream(), Stream.of("sub", "linked-folder", "hard.db")).toList());
  }

  @Test
  void aLinkIsNeverWrittenThroughToTheDatabaseOrAnywhereElse() throws Exception {
    Path link = Files.createSymbolicLink(dir.resolve("out.csv"), db);
    refused(outputs(), link, "symbolic link to the open database");
    Path other = dir.resolve("other.txt");
    Files.writeString(other, "someone's notes");
    Path toOther = Files.createSymbolicLink(dir.resolve("notes-link.txt"), other);
    refused(outputs(), toOther, "symbolic link (to " + other, "does not write through or over links");
    Path dangling = Files.createSymbolicLink(dir.resolve("dangling.pdf"), dir.resolve("nowhere"));
    refused(outputs(), dangling, "symbolic link");
    assertThat(Files.readAllBytes(db)).isEqualTo(RECORDS);
    assertThat(Files.readString(other)).isEqualTo("someone's notes");
    assertThat(Files.isSymbolicLink(link)).isTrue();
    assertThat(Files.exists(dir.resolve("nowhere"))).isFalse();
  }

  @Test
  void aFileTheRunReadsIsRefusedAndTwoOutputsMayNotBeOneFile() throws Exception {
    Path input = dir.resolve("site.json");
    Files.writeString(input, "{\"the\": \"input\"}");
    OutputFiles o = outputs().withInput(input);
    refused(o, input, "a file this command reads");
    refused(o, dir.resolve("./site.json"), "a file this command reads");
    assertThat(Files.readString(input)).isEqualTo("{\"the\": \"input\"}");
    assertThatThrownBy(() -> o.check(dir.resolve("order.pdf"), dir.resolve("x/../order.pdf")))
        .isInstanceOf(UserInputException.class)
        .hasMessageContaining("are the same file");
    assertThat(Files.exists(dir.resolve("order.pdf"))).isFalse();
  }

  @Test
  void aFolderOrAnySqliteDatabaseIsNeverReplaced() throws Exception {
    refused(outputs(), dir, "is a folder");
    Path another = dir.resolve("another.db");
    byte[] sqlite = "SQLite format 3\0 and pages".getBytes(StandardCharsets.US_ASCII);
    Files.write(another, sqlite);
    refused(outputs(), another, "is a SQLite database");
    assertThat(Files.readAllBytes(another)).isEqualTo(sqlite);
  }

  @Test
  void aFailureHalfWayLeavesTheOldFileAsItWasAndNoTemporaryFile() throws Exception {
    Path report = dir.resolve("report.pdf");
    Files.writeString(report, "yesterday's report");
    List<String> before = listing();
    assertThatThrownBy(() -> outputs().write(report, out -> {
      out.write("half of today's rep".getBytes(StandardCharsets.UTF_8));
      throw new IOException("disk full");
    })).isInstanceOf(UserInputException.class)
        .hasMessageContaining("cannot write " + report)
        .hasMessageContaining("disk full");
    assertThat(Files.readString(report)).isEqualTo("yesterday's report");
    assertThat(listing()).isEqualTo(before);
    // a fault of the program itself: passed on, and the same clean-up
    assertThatThrownBy(() -> outputs().write(report, out -> {
      out.write(1);
      throw new IllegalStateException("renderer fault");
    })).isInstanceOf(IllegalStateException.class);
    assertThat(Files.readString(report)).isEqualTo("yesterday's report");
    assertThat(listing()).isEqualTo(before);
  }

  @Test
  void anOrdinaryFileIsReplacedWholeAndMissingFoldersAreMade() throws Exception {
    Path report = dir.resolve("report.pdf");
    Files.writeString(report, "yesterday's report, longer than today's");
    outputs().writeText(report, "today's");
    assertThat(Files.readString(report)).isEqualTo("today's");
    Path nested = dir.resolve("out/2025/order.csv");
    outputs().write(nested, out -> {
      out.write("a,b\n".getBytes(StandardCharsets.UTF_8));
      out.close(); // a body may close the stream: the file is still synced and moved
    });
    assertThat(Files.readString(nested)).isEqualTo("a,b\n");
    assertThat(listing()).containsExactlyInAnyOrder("out", "report.pdf", "site.db");
    try (Stream<Path> s = Files.list(nested.getParent())) {
      assertThat(s.map(p -> p.getFileName().toString()).toList()).containsExactly("order.csv");
    }
  }
}
