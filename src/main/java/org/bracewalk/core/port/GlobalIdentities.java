package org.bracewalk.core.port;

import java.util.Map;
import java.util.Optional;

/**
 * Global identities: every record a sync moves between a field file and the team server carries a
 * UUID, the same in every copy of the record, while ids are local to one database. The store
 * gives each new record a random one; a record copied from another database keeps its own
 * ({@link #adopting}).
 */
public interface GlobalIdentities {

  /** The kinds of record that carry a global identity. */
  enum Kind {
    SITE("site"),
    STRUCTURE("structure"),
    PLANE("plane"),
    DESIGN_REVISION("design revision"),
    INSPECTION("inspection"),
    OBSERVATION("observation"),
    PHOTO("photo"),
    REPAIR_ORDER("repair order"),
    REPAIR_ACTION("repair action"),
    ISSUED_REPORT("issued document");

    private final String words;

    Kind(String words) {
      this.words = words;
    }

    /** The kind in a message's words. */
    public String words() {
      return words;
    }
  }

  /**
   * The global identity of a stored record.
   *
   * @throws NotFoundInStoreException when no record of that kind has the id
   */
  String uuidOf(Kind kind, long id);

  /**
   * The global identities of the stored records of a kind with the given ids, by id (an id not
   * stored is left out).
   */
  Map<Long, String> uuidsOf(Kind kind, java.util.Collection<Long> ids);

  /** The global identities of every stored record of a kind, by id. */
  Map<Long, String> all(Kind kind);

  /** The local id of the record of that kind with the global identity, if stored here. */
  Optional<Long> idOf(Kind kind, String uuid);

  /**
   * Runs {@code insert} so that the one record of {@code kind} it adds gets {@code uuid} (a copy
   * of a record from another database keeps its identity); every other record it adds gets a new
   * one. The uuid must be unused here: the store refuses a second record with it.
   */
  <T> T adopting(Kind kind, String uuid, RecordStore.Work<T> insert);

  /** Thrown when a record asked for is not stored. */
  final class NotFoundInStoreException extends StoreException {
    private static final long serialVersionUID = 1L;

    public NotFoundInStoreException(String message) {
      super(message);
    }
  }
}
