package org.bracewalk.app;

import java.util.List;
import org.bracewalk.core.model.Observation;

/**
 * What recording an observation CSV did.
 *
 * @param recorded the observations this run stored, in file order
 * @param alreadyRecorded rows skipped because an earlier run of the same file (same content) had
 *     recorded them into the same inspection
 */
public record CsvRecording(List<Observation> recorded, int alreadyRecorded) {
  public CsvRecording {
    recorded = List.copyOf(recorded);
  }

  /** "N recorded, M already recorded by an earlier run" (the second part only when M > 0). */
  public String summary() {
    return recorded.size() + " recorded"
        + (alreadyRecorded == 0 ? "" : ", " + alreadyRecorded + " already recorded by an earlier run");
  }
}
