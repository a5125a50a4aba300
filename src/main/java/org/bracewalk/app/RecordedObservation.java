package org.bracewalk.app;

import java.util.List;
import org.bracewalk.core.model.Observation;
import org.bracewalk.core.model.Photo;

/** An observation as stored, with the photos stored in the same transaction. */
public record RecordedObservation(Observation observation, List<Photo> photos) {
  public RecordedObservation {
    photos = List.copyOf(photos);
  }
}
