package org.bracewalk.ui.walk;

import static org.assertj.core.api.Assertions.assertThat;

import java.awt.image.BufferedImage;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Instant;
import java.util.Set;
import javax.imageio.ImageIO;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** The camera folder offers only pictures the record keeps: JPEG and PNG by their bytes. */
class CameraFolderPicturesTest {
  @TempDir Path folder;

  @Test
  void aPhonesHeicAndATextFileNamedJpgArePassedOverByNameAndARealJpegIsTaken() throws Exception {
    Path jpeg = folder.resolve("IMG_0002.jpg");
    ImageIO.write(new BufferedImage(4, 4, BufferedImage.TYPE_INT_RGB), "jpeg", jpeg.toFile());
    // an ISO media file: a box size, then "ftyp" at byte 4 (ISO/IEC 14496-12), as HEIC starts
    Files.write(folder.resolve("IMG_0003.heic"),
        new byte[] {0, 0, 0, 0x18, 'f', 't', 'y', 'p', 'h', 'e', 'i', 'c', 0, 0});
    Files.writeString(folder.resolve("IMG_0004.jpg"), "not a picture");
    CameraFolder.Found found =
        CameraFolder.newPhotos(folder, Set.of(), Instant.now().minusSeconds(60), Set.of());
    assertThat(found.photos()).containsExactly(jpeg.toAbsolutePath());
    assertThat(found.passedOver()).containsExactlyInAnyOrder(
        "IMG_0003.heic (" + CameraFolder.NOT_A_PICTURE + ")",
        "IMG_0004.jpg (" + CameraFolder.NOT_A_PICTURE + ")");
    assertThat(CameraFolder.problem(folder.resolve("IMG_0004.jpg")))
        .contains(CameraFolder.NOT_A_PICTURE);
    assertThat(CameraFolder.problem(jpeg)).isEmpty();
  }
}
