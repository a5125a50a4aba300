package org.bracewalk.app.report;

import java.util.List;
import java.util.Optional;
import org.bracewalk.core.model.IssuedReport;

/**
 * What checking a document against the database found. A document matches only when its bytes
 * are those of a copy in the register of issued documents, its stamp names that same registered
 * document, and the inspection's records still give the registered fingerprint.
 *
 * @param outcome match, differs, or not a Bracewalk document
 * @param kind the document's kind ({@code inspection-report}, {@code repair-order} or, for a
 *     registered CSV, {@code repair-order-csv}); empty when not ours
 * @param inspectionId the inspection it is about, empty when not ours
 * @param fingerprint the records fingerprint the document was issued with (as registered, else as
 *     its stamp carries it), empty when not ours
 * @param differences what differs, one line each (empty on a match)
 * @param issuedCopy the registered copy whose bytes are exactly this file's, if there is one
 * @param notes what the user should know besides (e.g. a copy registered before the register
 *     kept record fingerprints)
 */
public record Verification(
    Outcome outcome,
    String kind,
    String inspectionId,
    String fingerprint,
    List<String> differences,
    Optional<IssuedReport> issuedCopy,
    List<String> notes) {

  /** The three answers, with the exit status the command line gives each. */
  public enum Outcome {
    MATCH(0),
    DIFFERS(1),
    NOT_OURS(2);

    private final int exitCode;

    Outcome(int exitCode) {
      this.exitCode = exitCode;
    }

    public int exitCode() {
      return exitCode;
    }
  }

  public Verification {
    differences = List.copyOf(differences);
    notes = List.copyOf(notes);
    if (outcome == Outcome.MATCH && !differences.isEmpty()
        || outcome == Outcome.DIFFERS && differences.isEmpty()) {
      throw new IllegalArgumentException("a match has no differences, and only a match");
    }
    if (outcome == Outcome.MATCH && issuedCopy.isEmpty()) {
      throw new IllegalArgumentException("a match needs the issued copy it matched");
    }
  }

  static Verification notOurs() {
    return new Verification(Outcome.NOT_OURS, "", "", "", List.of(), Optional.empty(), List.of());
  }
}
