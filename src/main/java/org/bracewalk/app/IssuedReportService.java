package org.bracewalk.app;

import java.security.MessageDigest;
import java.security.NoSuchAlgorithmException;
import java.time.Clock;
import java.util.HexFormat;
import java.util.List;
import java.util.Objects;
import java.util.Optional;
import org.bracewalk.core.model.IssuedReport;
import org.bracewalk.core.port.RecordStore;

/** Remembers the report files issued for inspections, by name and SHA-256, to check copies later. */
public final class IssuedReportService {
  private final RecordStore store;
  private final Clock clock;

  public IssuedReportService(RecordStore store, Clock clock) {
    this.store = Objects.requireNonNull(store);
    this.clock = Objects.requireNonNull(clock);
  }

  /** The SHA-256 of the bytes, as 64 lower-case hex digits. */
  public static String fingerprint(byte[] bytes) {
    try {
      return HexFormat.of().formatHex(MessageDigest.getInstance("SHA-256").digest(bytes));
    } catch (NoSuchAlgorithmException e) {
      throw new IllegalStateException("every Java has SHA-256", e);
    }
  }

  /** Records that {@code bytes} were issued as {@code fileName} for an inspection, now. */
  public IssuedReport recordIssued(long inspectionId, String fileName, byte[] bytes) {
    store.inspections().find(inspectionId)
        .orElseThrow(() -> new NotFoundException("inspection " + inspectionId));
    return store.issuedReports()
        .add(new IssuedReport(0, inspectionId, fileName, fingerprint(bytes), clock.instant()));
  }

  /** The reports issued for an inspection, oldest first. */
  public List<IssuedReport> issued(long inspectionId) {
    return store.issuedReports().ofInspection(inspectionId);
  }

  /** The issued report these bytes are an unchanged copy of, if any. */
  public Optional<IssuedReport> matching(long inspectionId, byte[] bytes) {
    String f = fingerprint(bytes);
    return issued(inspectionId).stream().filter(r -> r.fingerprint().equals(f)).findFirst();
  }
}
