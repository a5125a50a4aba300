package org.bracewalk.app.report;

import java.util.List;
import org.bracewalk.app.UserInputException;
import org.bracewalk.core.model.Jurisdiction;
import org.bracewalk.core.port.report.Particular;

/** A report was asked for while recorded particulars are empty; names every one of them. */
public class MissingParticularsException extends UserInputException {
  private static final long serialVersionUID = 1L;

  private final transient List<Particular> missing;

  public MissingParticularsException(long inspectionId, List<Particular> missing) {
    this(inspectionId, missing, Jurisdiction.OTHER);
  }

  /** As above, naming whose rules ask for them (the site's jurisdiction). */
  public MissingParticularsException(long inspectionId, List<Particular> missing,
      Jurisdiction jurisdiction) {
    super("inspection " + inspectionId + ": the report needs every particular "
        + (jurisdiction == Jurisdiction.OTHER
            ? "(the site records no jurisdiction, so every one Bracewalk knows)"
            : "the rules of its site's jurisdiction (" + jurisdiction.title() + ") ask for")
        + ", and these are empty: "
        + String.join(", ", missing.stream().map(Particular::code).toList())
        + ". Record them on the inspection (a finalised inspection cannot be changed: start a new"
        + " one with them given).");
    this.missing = List.copyOf(missing);
  }

  public List<Particular> missing() {
    return missing;
  }
}
