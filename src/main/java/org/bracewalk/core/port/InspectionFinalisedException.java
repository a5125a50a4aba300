package org.bracewalk.core.port;

/**
 * A change was attempted to a finalised inspection (or to its observations or photos). Thrown by
 * the application before it tries, and by the store when the database's own triggers refuse.
 */
public class InspectionFinalisedException extends StoreException {
  private static final long serialVersionUID = 1L;

  private final long inspectionId;

  public InspectionFinalisedException(long inspectionId, String attempted) {
    super(message(inspectionId, attempted));
    this.inspectionId = inspectionId;
  }

  public InspectionFinalisedException(long inspectionId, String attempted, Throwable cause) {
    super(message(inspectionId, attempted), cause);
    this.inspectionId = inspectionId;
  }

  private static String message(long inspectionId, String attempted) {
    return "inspection "
        + inspectionId
        + " is finalised and cannot be changed ("
        + attempted
        + "); start a new inspection to record new findings";
  }

  /** The inspection that refused the change. */
  public long inspectionId() {
    return inspectionId;
  }
}
