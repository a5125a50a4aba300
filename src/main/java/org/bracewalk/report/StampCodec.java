package org.bracewalk.report;

import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import org.bracewalk.core.port.report.DocumentStamp;
import org.bracewalk.core.port.report.RecordFingerprint;
import org.bracewalk.core.port.report.SectionDigest;

/**
 * How a stamp is kept in a PDF's document information: one entry per field, the section digests
 * one per line as {@code name=sha256}. Reading is strict: anything missing or malformed means the
 * file is not one of ours.
 */
final class StampCodec {
  static final String KIND = "BracewalkKind";
  static final String INSPECTION = "BracewalkInspection";
  static final String SCHEME = "BracewalkScheme";
  static final String FINGERPRINT = "BracewalkFingerprint";
  static final String SECTIONS = "BracewalkSections";

  private StampCodec() {}

  static Map<String, String> encode(DocumentStamp stamp) {
    Map<String, String> info = new HashMap<>();
    info.put(KIND, stamp.kind());
    info.put(INSPECTION, stamp.inspectionId());
    info.put(SCHEME, stamp.fingerprint().scheme());
    info.put(FINGERPRINT, stamp.fingerprint().sha256());
    StringBuilder sb = new StringBuilder();
    for (SectionDigest d : stamp.fingerprint().sections()) {
      sb.append(d.name()).append('=').append(d.sha256()).append('\n');
    }
    info.put(SECTIONS, sb.toString());
    return info;
  }

  static Optional<DocumentStamp> decode(Map<String, String> info) {
    String kind = info.get(KIND);
    String inspection = info.get(INSPECTION);
    String scheme = info.get(SCHEME);
    String fingerprint = info.get(FINGERPRINT);
    String sections = info.get(SECTIONS);
    if (kind == null || inspection == null || scheme == null || fingerprint == null
        || sections == null) {
      return Optional.empty();
    }
    if (!kind.equals(DocumentStamp.REPORT) && !kind.equals(DocumentStamp.REPAIR_ORDER)) {
      return Optional.empty();
    }
    try {
      List<SectionDigest> list = new ArrayList<>();
      for (String line : sections.split("\n")) {
        if (line.isEmpty()) {
          continue;
        }
        int eq = line.lastIndexOf('=');
        if (eq <= 0) {
          return Optional.empty();
        }
        list.add(new SectionDigest(line.substring(0, eq), line.substring(eq + 1)));
      }
      return Optional.of(
          new DocumentStamp(kind, inspection, new RecordFingerprint(scheme, fingerprint, list)));
    } catch (IllegalArgumentException e) {
      return Optional.empty();
    }
  }
}
