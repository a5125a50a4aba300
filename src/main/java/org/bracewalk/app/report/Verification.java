package org.bracewalk.app.report;

import java.util.List;
import java.util.Optional;
import org.bracewalk.core.model.IssuedReport;

/**
 * What checking a document against the database found.
 *
 * @param outcome match, differs, or not a Bracewalk document
 * @param kind the document's kind ({@code inspection-report} or {@code repair-order}), empty when
 *     not ours
 * @param inspectionId the inspection it is about, empty when not ours
 * @param fingerprint the fingerprint the document carries, empty when not ours
 * @param differences what differs, one line each (empty on a match)
 * @param issuedCopy the issued report whose bytes are exactly this file's, if one is recorded
 */
public record Verification(
    Outcome outcome,
    String kind,
    String inspectionId,
    String fingerprint,
    List<String> differences,
    Optional<IssuedReport> issuedCopy) {

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
  }

  static Verification notOurs() {
    return new Verification(Outcome.NOT_OURS, "", "", "", List.of(), Optional.empty());
  }
}
