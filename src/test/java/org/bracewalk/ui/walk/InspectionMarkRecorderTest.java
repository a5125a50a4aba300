package org.bracewalk.ui.walk;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

import java.awt.image.BufferedImage;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import javax.imageio.ImageIO;
import org.bracewalk.app.Fixtures;
import org.bracewalk.app.NewInspection;
import org.bracewalk.app.UserInputException;
import org.bracewalk.core.model.Inspection;
import org.bracewalk.core.model.InspectionReason;
import org.bracewalk.core.model.PanelRef;
import org.bracewalk.core.model.PanelState;
import org.bracewalk.core.model.PlaneRecord;
import org.bracewalk.store.Database;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** The walk-round's recorder stores a mark and its photos through the one app call. */
class InspectionMarkRecorderTest {
  @TempDir Path dir;

  @Test
  void aMarkWithOneBadPhotoRecordsNeitherTheMarkNorItsGoodPhotos() throws Exception {
    try (Database db = Database.open(dir.resolve("t.db"))) {
      Fixtures.Services s = Fixtures.Services.over(db);
      PlaneRecord plane = Fixtures.plane(s);
      Inspection inspection = s.inspections().start(plane.structureId(),
          NewInspection.of("M. Okafor", "", InspectionReason.ROUTINE));
      Path good = dir.resolve("good.png");
      ImageIO.write(new BufferedImage(4, 4, BufferedImage.TYPE_INT_RGB), "png", good.toFile());
      Path bad = dir.resolve("bad.jpg");
      Files.writeString(bad, "not a picture");
      InspectionMarkRecorder recorder =
          new InspectionMarkRecorder(s.inspections(), inspection.id(), plane.id(), "M. Okafor");
      Mark withBad = new Mark(PanelState.MISSING, null, null, null, null, "", List.of(good, bad));
      assertThatThrownBy(() -> recorder.record(PanelRef.of(1, 1), withBad))
          .isInstanceOf(UserInputException.class)
          .hasMessageContaining("photo " + bad + " is not a JPEG or PNG picture");
      assertThat(s.inspections().observations(inspection.id())).isEmpty();
      RecordedMark made = recorder.record(PanelRef.of(1, 1),
          new Mark(PanelState.MISSING, null, null, null, null, "", List.of(good)));
      assertThat(s.inspections().photos(made.id())).singleElement()
          .satisfies(p -> assertThat(p.mediaType()).isEqualTo("image/png"));
      RecordedMark fixed = recorder.correct(made,
          new Mark(PanelState.SOUND, null, null, null, null, "", List.of()), "looked again");
      assertThat(s.inspections().observations(inspection.id())).hasSize(2)
          .allSatisfy(o -> assertThat(o.inspectionId()).isEqualTo(inspection.id()));
      assertThat(fixed.id()).isGreaterThan(made.id());
    }
  }
}
