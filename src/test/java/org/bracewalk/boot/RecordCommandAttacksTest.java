package org.bracewalk.boot;

import org.bracewalk.boot.Commands.Run;
import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

import java.awt.image.BufferedImage;
import java.io.RandomAccessFile;
import java.nio.file.Files;
import java.nio.file.Path;
import java.sql.Connection;
import java.sql.DriverManager;
import java.sql.ResultSet;
import java.sql.Statement;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import javax.imageio.ImageIO;
import org.bracewalk.app.Fixtures;
import org.bracewalk.core.analysis.PlaneAnalyzer;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * {@code record} attacked: a correction aimed at another inspection, and photos that are missing,
 * too large, or not pictures. Each must be refused by name with exit 2 and leave the record as it
 * was; a good photo is stored with its observation.
 */
class RecordCommandAttacksTest {
  @TempDir Path dir;

  private final AppContext context =
      new AppContext(new Fixtures.SteppingClock(), PlaneAnalyzer.standard());

  private Run run(String... args) {
    return Commands.run(context, Map.of(), args);
  }

  private String db() {
    return dir.resolve("site.db").toString();
  }

  @BeforeEach
  void twoOpenInspectionsOfTheRackingRun() {
    // the demo holds inspections 1-3 (finalised) and observations 1-123
    assertThat(run("demo", "--db", db()).code()).isZero();
    assertThat(run("inspection", "start", "--db", db(), "--structure", "1", "--inspector",
        "Priya Danvers").out()).contains("inspection 4 started");
    assertThat(run("inspection", "start", "--db", db(), "--structure", "1", "--inspector",
        "Priya Danvers").out()).contains("inspection 5 started");
  }

  private Run record(String inspection, String... more) {
    List<String> args = new ArrayList<>(List.of("record", "--db", db(), "--inspection",
        inspection, "--plane", "frame 2", "--lift", "1", "--bay", "1"));
    args.addAll(List.of(more));
    return run(args.toArray(String[]::new));
  }

  private long count(String sql) throws Exception {
    try (Connection c = DriverManager.getConnection("jdbc:sqlite:" + db());
        Statement s = c.createStatement();
        ResultSet r = s.executeQuery(sql)) {
      r.next();
      return r.getLong(1);
    }
  }

  private long observations() throws Exception {
    return count("SELECT count(*) FROM observations");
  }

  private long photos() throws Exception {
    return count("SELECT count(*) FROM photos");
  }

  @Test
  void aCorrectionNamingAnObservationOfAnotherInspectionIsRefusedNamingBoth() throws Exception {
    Run first = record("4", "--state", "missing");
    assertThat(first.out()).contains("observation 124 recorded");
    Run attack = record("5", "--state", "sound", "--supersedes", "124", "--reason", "misread");
    assertThat(attack.code()).as(attack.err()).isEqualTo(2);
    assertThat(attack.err()).contains("observation 124 is of inspection 4, not of inspection 5");
    assertThat(attack.out()).isEmpty();
    assertThat(run("inspection", "show", "--db", db(), "--inspection", "4").out())
        .contains("1 observations:");
    assertThat(run("inspection", "show", "--db", db(), "--inspection", "5").out())
        .contains("0 observations:");
    // in the right inspection the same correction is recorded there
    Run fix = record("4", "--state", "sound", "--supersedes", "124", "--reason", "misread");
    assertThat(fix.code()).as(fix.err()).isZero();
    assertThat(fix.out()).contains("observation 125 recorded").contains("corrects observation 124");
    assertThat(count("SELECT inspection_id FROM observations WHERE id = 125")).isEqualTo(4);
    // past the program: the database itself refuses a cross-inspection correction
    long before = observations();
    try (Connection c = DriverManager.getConnection("jdbc:sqlite:" + db());
        Statement s = c.createStatement()) {
      assertThatThrownBy(() -> s.executeUpdate("INSERT INTO observations (inspection_id,"
          + " plane_id, lift, bay, state, recorded_at, supersedes_id, correction_reason)"
          + " VALUES (5, 2, 1, 2, 'sound', '2025-03-06T10:00:00.000Z', 125, 'sneaked in')"))
          .isInstanceOf(java.sql.SQLException.class);
    }
    assertThat(observations()).isEqualTo(before);
  }

  @Test
  void aMissingPhotoRecordsNothing() throws Exception {
    Path gone = dir.resolve("IMG_4410.jpg");
    Run r = record("4", "--state", "missing", "--photo", gone.toString());
    assertThat(r.code()).as(r.err()).isEqualTo(2);
    assertThat(r.err()).contains("error: photo " + gone + ": no such file");
    assertThat(r.out()).isEmpty();
    assertThat(observations()).isEqualTo(123);
  }

  @Test
  void aPhotoOverTheLimitIsRefusedBeforeItIsReadAndRecordsNothing() throws Exception {
    // sparse files: their size on disk is what counts, and reading them would need the memory
    Path justOver = sparse("just-over.jpg", 20L * 1024 * 1024 + 1);
    Path huge = sparse("huge.jpg", 3L << 30);
    for (Path p : List.of(justOver, huge)) {
      Run r = record("4", "--state", "missing", "--photo", p.toString());
      assertThat(r.code()).as(r.err()).isEqualTo(2);
      assertThat(r.err()).contains("error: photo " + p + " holds " + Files.size(p) + " bytes")
          .contains("up to 20 MB");
    }
    assertThat(observations()).isEqualTo(123);
    assertThat(photos()).isEqualTo(1);
  }

  private Path sparse(String name, long size) throws Exception {
    Path p = dir.resolve(name);
    try (RandomAccessFile f = new RandomAccessFile(p.toFile(), "rw")) {
      f.write(new byte[] {(byte) 0xFF, (byte) 0xD8, (byte) 0xFF});
      f.setLength(size);
    }
    return p;
  }

  @Test
  void aFileThatIsNotAPictureTheReportCanDrawIsRefusedByName() throws Exception {
    Path text = dir.resolve("notes.jpg");
    Files.writeString(text, "bay 1 brace bent, see photo\n");
    // a phone's HEIC: an ISO media file, "ftyp" at byte 4 (ISO/IEC 14496-12)
    Path heic = dir.resolve("IMG_0001.heic");
    Files.write(heic, new byte[] {0, 0, 0, 0x18, 'f', 't', 'y', 'p', 'h', 'e', 'i', 'c', 0, 0});
    Path good = png("good.png");
    for (Path p : List.of(text, heic)) {
      // a good photo beside it is not stored either: all or nothing
      Run r = record("4", "--state", "missing", "--photo", good.toString(), "--photo",
          p.toString());
      assertThat(r.code()).as(r.err()).isEqualTo(2);
      assertThat(r.err()).contains("error: photo " + p + " is not a JPEG or PNG picture");
      assertThat(r.out()).isEmpty();
    }
    assertThat(observations()).isEqualTo(123);
    assertThat(photos()).isEqualTo(1);
  }

  @Test
  void aPngAndAJpegAreStoredWithTheirObservationInOneGo() throws Exception {
    Path png = png("bay1.png");
    Path jpeg = dir.resolve("bay1-close.jpg");
    ImageIO.write(image(), "jpeg", jpeg.toFile());
    // the media type comes from the bytes: a PNG named .jpg is kept as a PNG
    Path misnamed = dir.resolve("misnamed.jpg");
    Files.copy(png, misnamed);
    Run r = record("4", "--state", "damaged-ineffective", "--defect", "bent", "--photo",
        png.toString(), "--photo", jpeg.toString(), "--photo", misnamed.toString());
    assertThat(r.code()).as(r.err()).isZero();
    assertThat(r.out()).contains("observation 124 recorded")
        .contains("photo 2 attached to observation 124: bay1.png (" + Files.size(png)
            + " bytes, image/png)")
        .contains("photo 3 attached to observation 124: bay1-close.jpg (" + Files.size(jpeg)
            + " bytes, image/jpeg)")
        .contains("photo 4 attached to observation 124: misnamed.jpg (" + Files.size(png)
            + " bytes, image/png)");
    assertThat(observations()).isEqualTo(124);
    assertThat(count("SELECT count(*) FROM photos WHERE observation_id = 124")).isEqualTo(3);
  }

  @Test
  void recordingTheSameFileAgainRecordsNothingTwice() throws Exception {
    Path csv = dir.resolve("walk.csv");
    Files.writeString(csv, "plane,lift,bay,state,supersedes_row,correction_reason\n"
        + "frame 2,1,1,missing,,\nframe 2,2,1,sound,,\nframe 2,1,1,sound,1,found it\n");
    Run first = run("record", "--db", db(), "--inspection", "4", "--from", csv.toString());
    assertThat(first.code()).as(first.err()).isZero();
    assertThat(first.out()).contains("observation 126 recorded").contains("corrects observation 124");
    assertThat(first.err()).contains("observations of " + csv + ": 3 recorded in inspection 4");
    Run again = run("record", "--db", db(), "--inspection", "4", "--from", csv.toString());
    assertThat(again.code()).as(again.err()).isZero();
    assertThat(again.out()).isEmpty();
    assertThat(again.err()).contains(": 0 recorded, 3 already recorded by an earlier run");
    assertThat(observations()).isEqualTo(126);
    // the all-or-nothing import knows the rows too
    Run imported = run("import", "--db", db(), "--inspection", "4", "--csv", csv.toString());
    assertThat(imported.code()).as(imported.err()).isZero();
    assertThat(imported.out()).contains("imported 0 observations into inspection 4 (3 rows"
        + " already recorded by an earlier run)");
    assertThat(observations()).isEqualTo(126);
  }

  /** Through the command line: exit 2, and the error says what is recorded (here: nothing). */
  @Test
  void aDatabaseThatStaysBusyStopsTheRecordingWithExit2AndSaysWhatIsRecorded() throws Exception {
    Path csv = dir.resolve("walk.csv");
    Files.writeString(csv, "plane,lift,bay,state\nframe 2,1,1,missing\nframe 2,2,1,sound\n");
    try (Connection other = DriverManager.getConnection("jdbc:sqlite:" + db());
        Statement lock = other.createStatement()) {
      lock.execute("BEGIN IMMEDIATE");
      Run r = run("record", "--db", db(), "--inspection", "4", "--from", csv.toString());
      lock.execute("ROLLBACK");
      assertThat(r.code()).isEqualTo(2);
      assertThat(r.out()).isEmpty();
      assertThat(r.err()).contains("error: recording " + csv + " stopped at line 2: the database "
          + db() + " stayed busy for 10 s (another Bracewalk is writing to it). No row of " + csv
          + " is recorded by this run; nothing after it; run the same command again to record the"
          + " rest");
    }
    Run again = run("record", "--db", db(), "--inspection", "4", "--from", csv.toString());
    assertThat(again.code()).as(again.err()).isZero();
    assertThat(again.err()).contains(": 2 recorded in inspection 4");
  }

  private static BufferedImage image() {
    BufferedImage img = new BufferedImage(8, 6, BufferedImage.TYPE_INT_RGB);
    img.setRGB(2, 3, 0xCC3300);
    return img;
  }

  private Path png(String name) throws Exception {
    Path p = dir.resolve(name);
    ImageIO.write(image(), "png", p.toFile());
    return p;
  }
}
