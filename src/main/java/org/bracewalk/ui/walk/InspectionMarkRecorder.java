package org.bracewalk.ui.walk;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Objects;
import org.bracewalk.app.InspectionService;
import org.bracewalk.app.NewObservation;
import org.bracewalk.app.UserInputException;
import org.bracewalk.core.model.Observation;
import org.bracewalk.core.model.PanelRef;
import org.bracewalk.core.model.Photo;
import org.bracewalk.core.port.RecordStore;

/**
 * Records the walk-round's marks as observations of one plane in an open inspection. A mark and
 * its photos are committed together (one transaction): the photo files are read first, so a file
 * that cannot be read records nothing.
 */
public final class InspectionMarkRecorder implements MarkRecorder {
  private final InspectionService inspections;
  private final RecordStore store;
  private final long inspectionId;
  private final long planeId;
  private final String recordedBy;

  public InspectionMarkRecorder(
      InspectionService inspections, RecordStore store, long inspectionId, long planeId, String recordedBy) {
    this.inspections = Objects.requireNonNull(inspections, "inspections");
    this.store = Objects.requireNonNull(store, "store");
    this.inspectionId = inspectionId;
    this.planeId = planeId;
    this.recordedBy = recordedBy;
  }

  @Override
  public RecordedMark record(PanelRef panel, Mark mark) {
    List<PhotoFile> photos = read(mark.photos());
    Observation o =
        store.inTransaction(() -> {
          Observation saved = inspections.recordObservation(inspectionId, observation(panel, mark));
          attach(saved, photos);
          return saved;
        });
    return new RecordedMark(o.id(), panel, mark);
  }

  @Override
  public RecordedMark correct(RecordedMark earlier, Mark replacement, String reason) {
    List<PhotoFile> photos = read(replacement.photos());
    Observation o =
        store.inTransaction(() -> {
          Observation saved = inspections.correct(earlier.id(), observation(earlier.panel(), replacement), reason);
          attach(saved, photos);
          return saved;
        });
    return new RecordedMark(o.id(), earlier.panel(), replacement);
  }

  private NewObservation observation(PanelRef panel, Mark m) {
    return new NewObservation(
        planeId, panel, m.state(), m.memberFound(), m.bowMm(), m.gaugeLengthMm(), m.defect(),
        m.note(), recordedBy);
  }

  private void attach(Observation o, List<PhotoFile> photos) {
    for (PhotoFile p : photos) {
      inspections.attachPhoto(o.id(), p.name(), p.mediaType(), p.data());
    }
  }

  private record PhotoFile(String name, String mediaType, byte[] data) {}

  private static List<PhotoFile> read(List<Path> files) {
    List<PhotoFile> out = new ArrayList<>();
    for (Path f : files) {
      byte[] data;
      try {
        data = Files.readAllBytes(f);
      } catch (IOException e) {
        throw new UserInputException("photo " + f + " cannot be read (" + e.getMessage() + "); pick it again");
      }
      if (data.length == 0 || data.length > Photo.MAX_BYTES) {
        throw new UserInputException(
            "photo " + f + " holds " + data.length + " bytes; a photo must hold 1 byte to 20 MB");
      }
      out.add(new PhotoFile(f.getFileName().toString(), mediaType(f), data));
    }
    return out;
  }

  static String mediaType(Path f) {
    String n = f.getFileName().toString().toLowerCase(Locale.ROOT);
    if (n.endsWith(".png")) {
      return "image/png";
    }
    if (n.endsWith(".jpg") || n.endsWith(".jpeg")) {
      return "image/jpeg";
    }
    if (n.endsWith(".heic")) {
      return "image/heic";
    }
    return "application/octet-stream";
  }

  /** The marks already recorded for the plane in this inspection: the latest per panel. */
  public static List<RecordedMark> existing(InspectionService inspections, long inspectionId, long planeId) {
    List<RecordedMark> out = new ArrayList<>();
    inspections.latestObservations(inspectionId, planeId).forEach((p, o) -> out.add(
        new RecordedMark(o.id(), p,
            new Mark(o.state(), o.memberFound(), o.defect(), o.bowMm(), o.gaugeLengthMm(), o.note(), List.of()))));
    return out;
  }
}
