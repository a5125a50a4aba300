package org.bracewalk.core.port;

import java.util.List;
import java.util.Optional;
import org.bracewalk.core.model.Observation;
import org.bracewalk.core.model.Photo;

/**
 * Observations and their photos: append-only. Outside a transaction each {@link #add} is
 * committed (and synced to disk) before it returns, so a returned id is never lost.
 */
public interface ObservationRepository {
  /**
   * Stores a new observation (id 0) and returns it with its id.
   *
   * @throws InspectionFinalisedException when its inspection is finalised
   */
  Observation add(Observation observation);

  Optional<Observation> find(long id);

  /** Every observation of an inspection, superseded ones included, in the order recorded (id). */
  List<Observation> ofInspection(long inspectionId);

  /** Attaches a photo to an observation of an open inspection. */
  Photo addPhoto(Photo photo);

  /** The photos of one observation, in the order attached. */
  List<Photo> photosOf(long observationId);

  /** The ids of the observations of an inspection that have at least one photo. */
  List<Long> withPhotos(long inspectionId);
}
