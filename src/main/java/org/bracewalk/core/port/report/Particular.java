package org.bracewalk.core.port.report;

/**
 * The particulars a report must carry. Items 1-8 follow the Work at Height Regulations 2005,
 * Schedule 7 (see shared/design/trade-facts.md); the competent person and the shift are recorded
 * for US sites (29 CFR 1926.451(f)(3)); the person responsible for storage equipment safety for
 * racking (HSE HSG76). {@link #code()} is the template key suffix and the name used in messages.
 */
public enum Particular {
  /** Sch. 7 item 1: for whom the inspection was carried out (name). */
  CLIENT_NAME("client-name", true),
  /** Sch. 7 item 1: for whom the inspection was carried out (address). */
  CLIENT_ADDRESS("client-address", true),
  /** Sch. 7 item 2. */
  EQUIPMENT_LOCATION("equipment-location", true),
  /** Sch. 7 item 3. */
  EQUIPMENT_DESCRIPTION("equipment-description", true),
  /** Sch. 7 item 4. */
  INSPECTED_AT("inspected-at", true),
  /** Sch. 7 item 5. */
  RISK_MATTERS("risk-matters", true),
  /** Sch. 7 item 6. */
  ACTION_TAKEN("action-taken", true),
  /** Sch. 7 item 7. */
  FURTHER_ACTION("further-action", true),
  /** Sch. 7 item 8 (name). */
  REPORTER_NAME("reporter-name", true),
  /** Sch. 7 item 8 (position). */
  REPORTER_POSITION("reporter-position", true),
  /** US: the competent person who inspected. */
  COMPETENT_PERSON("competent-person", true),
  /** US: the shift the inspection was made before or during. */
  SHIFT("shift", true),
  /** Racking: person responsible for storage equipment safety; required for racking only. */
  STORAGE_SAFETY_PERSON("storage-safety-person", false);

  private final String code;
  private final boolean alwaysRequired;

  Particular(String code, boolean alwaysRequired) {
    this.code = code;
    this.alwaysRequired = alwaysRequired;
  }

  public String code() {
    return code;
  }

  /** False for the particulars that only some structures need. */
  public boolean alwaysRequired() {
    return alwaysRequired;
  }
}
