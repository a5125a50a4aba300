package org.bracewalk.ui.walk;

import static org.assertj.core.api.Assertions.assertThat;

import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.attribute.FileTime;
import java.time.Clock;
import java.time.Duration;
import java.time.Instant;
import java.time.ZoneOffset;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** "Since the previous mark" is read from the injected clock, never from the system's. */
class CameraFolderClockTest {
  /** A clock that reads {@code start}, then one minute later at each reading. */
  private static final class SteppingClock extends Clock {
    private Instant now;

    SteppingClock(Instant start) {
      now = start;
    }

    @Override
    public Instant instant() {
      Instant t = now;
      now = now.plus(Duration.ofMinutes(1));
      return t;
    }

    @Override
    public java.time.ZoneId getZone() {
      return ZoneOffset.UTC;
    }

    @Override
    public Clock withZone(java.time.ZoneId zone) {
      return this;
    }
  }

  private static Path photo(Path folder, String name, Instant written) throws java.io.IOException {
    // JPEG's first bytes (FF D8 FF, from the JPEG standard's start-of-image marker)
    Path f = Files.write(folder.resolve(name), new byte[] {(byte) 0xFF, (byte) 0xD8, (byte) 0xFF, (byte) 0xE0, 1, 2});
    Files.setLastModifiedTime(f, FileTime.from(written));
    return f.toAbsolutePath();
  }

  @Test
  void photosCountFromTheClocksOpeningAndFromEachMarkByTheClock(@TempDir Path dir) throws Exception {
    Instant opening = Instant.parse("2021-03-01T08:00:00Z"); // years before the system clock
    SteppingClock clock = new SteppingClock(opening);
    CameraFolder camera = new CameraFolder(CameraFolder.Setting.inMemory(), clock); // reads 08:00
    Path camDir = Files.createDirectories(dir.resolve("DCIM"));
    // no listing before the folder is chosen: only the time counts
    Path before = photo(camDir, "IMG_0001.jpg", opening.minusSeconds(60));
    Path after = photo(camDir, "IMG_0002.jpg", opening.plusSeconds(30));
    camera.choose(camDir);
    assertThat(camera.since()).isEqualTo(opening);
    assertThat(camera.take().photos()).containsExactly(after).doesNotContain(before);
    camera.taken(java.util.List.of(after));
    camera.markMade(); // reads 08:01
    assertThat(camera.since()).isEqualTo(opening.plusSeconds(60));
    // the listing now says what is new: a file written after the mark by a camera whose clock is behind
    Path behind = photo(camDir, "IMG_0003.jpg", opening.minusSeconds(3600));
    assertThat(camera.take().photos()).containsExactly(behind);
  }

  @Test
  void theOpeningIsTheClocksNotTheSystems(@TempDir Path dir) throws Exception {
    Instant opening = Instant.parse("2021-03-01T08:00:00Z");
    Path camDir = Files.createDirectories(dir.resolve("DCIM"));
    Path lastYear = photo(camDir, "IMG_0100.jpg", opening.plus(Duration.ofDays(1)));
    CameraFolder camera = new CameraFolder(CameraFolder.Setting.inMemory(), Clock.fixed(opening, ZoneOffset.UTC));
    camera.choose(camDir);
    // written after the clock's opening: new, though long before the system clock's now
    assertThat(camera.take().photos()).containsExactly(lastYear);
  }
}
