package org.bracewalk.app.verdict;

import com.fasterxml.jackson.databind.node.ObjectNode;
import java.util.Objects;
import java.util.Optional;

/**
 * The three parts of one plane's JSON verdict, for outputs that nest them (one entry per plane of
 * an inspection): {@code design}, {@code asBuilt} (present only when an as-built state was given)
 * and {@code repair}, each exactly as in the contract.
 */
public record VerdictParts(ObjectNode design, Optional<ObjectNode> asBuilt, ObjectNode repair) {
  public VerdictParts {
    Objects.requireNonNull(design, "design");
    Objects.requireNonNull(asBuilt, "asBuilt");
    Objects.requireNonNull(repair, "repair");
  }

  /** Puts the parts into {@code target} under their contract names, in contract order. */
  public ObjectNode putInto(ObjectNode target) {
    target.set("design", design);
    asBuilt.ifPresent(a -> target.set("asBuilt", a));
    target.set("repair", repair);
    return target;
  }
}
