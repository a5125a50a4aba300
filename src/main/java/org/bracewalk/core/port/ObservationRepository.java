package org.bracewalk.core.port;

import java.util.List;
import java.util.Map;
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

  /**
   * The observations recorded into an inspection from one file: the line each row starts on, to
   * the observation's id. Empty when none was.
   *
   * @param sourceSha256 the SHA-256 of the file's text (UTF-8), 64 lower-case hex digits
   */
  Map<Integer, Long> recordedFrom(long inspectionId, String sourceSha256);

  /**
   * Notes that an observation was recorded from a line of a file; call in the transaction that
   * adds the observation. Append-only: a line or an observation noted twice is refused.
   */
  void addSource(long inspectionId, String sourceSha256, int line, long observationId);
}
