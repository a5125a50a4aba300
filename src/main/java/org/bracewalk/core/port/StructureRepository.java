package org.bracewalk.core.port;

import java.util.List;
import java.util.Optional;
import org.bracewalk.core.model.Structure;

/** Structures of sites. */
public interface StructureRepository {
  /** Stores a new structure (id 0) and returns it with its id. */
  Structure add(Structure structure);

  Optional<Structure> find(long id);

  /** The structures of one site, by id. */
  List<Structure> ofSite(long siteId);

  /**
   * Sets the days between routine inspections of a structure (its only field that may change)
   * and returns the structure as now stored; empty when there is no such structure.
   */
  Optional<Structure> setInspectionInterval(long structureId, int days);

  /**
   * The structure an inspection is of, as that inspection has it: a finalised inspection keeps
   * the inspection interval as at its finalisation (what its report and fingerprint show, however
   * the interval changes later); an open one sees the structure as it is now. The other fields
   * never change. Empty when there is no such inspection.
   */
  Optional<Structure> asOfInspection(long inspectionId);
}
