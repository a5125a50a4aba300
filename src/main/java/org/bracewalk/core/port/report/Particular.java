package org.bracewalk.core.port.report;

/**
 * The particulars a report must carry. Items 1-8 follow the Work at Height Regulations 2005,
 * Schedule 7 (see shared/design/trade-facts.md); the competent person and the shift are recorded
 * for US sites (29 CFR 1926.451(f)(3)); the person responsible for storage equipment safety for
 * racking (HSE HSG76). {@link #code()} is the template key suffix and the name used in messages.
 *
 * <p>Most are recorded by people and may be missing, which stops the report. Items 5 and 7 are
 * drawn by the report itself from the findings and the repair plan, and item 6 from the repair
 * orders recorded against the inspection, so they are never empty.
 */
public enum Particular {
  /** Sch. 7 item 1: for whom the inspection was carried out (name). */
  CLIENT_NAME("client-name", Source.RECORDED),
  /** Sch. 7 item 1: for whom the inspection was carried out (address). */
  CLIENT_ADDRESS("client-address", Source.RECORDED),
  /** Sch. 7 item 2. */
  EQUIPMENT_LOCATION("equipment-location", Source.RECORDED),
  /** Sch. 7 item 3. */
  EQUIPMENT_DESCRIPTION("equipment-description", Source.RECORDED),
  /** Sch. 7 item 4. */
  INSPECTED_AT("inspected-at", Source.RECORDED),
  /** Sch. 7 item 5: drawn from the verdicts and the findings. */
  RISK_MATTERS("risk-matters", Source.DRAWN),
  /** Sch. 7 item 6: the repair orders recorded against the inspection. */
  ACTION_TAKEN("action-taken", Source.DRAWN),
  /** Sch. 7 item 7: drawn from the repair plan. */
  FURTHER_ACTION("further-action", Source.DRAWN),
  /** Sch. 7 item 8 (name). */
  REPORTER_NAME("reporter-name", Source.RECORDED),
  /** Sch. 7 item 8 (position). */
  REPORTER_POSITION("reporter-position", Source.RECORDED),
  /** US: the competent person who inspected. */
  COMPETENT_PERSON("competent-person", Source.RECORDED),
  /** US: the shift the inspection was made before or during. */
  SHIFT("shift", Source.RECORDED),
  /** Racking: person responsible for storage equipment safety; required for racking only. */
  STORAGE_SAFETY_PERSON("storage-safety-person", Source.RECORDED_FOR_RACKING);

  /** Where a particular's value comes from. */
  public enum Source {
    /** Entered by people; a report is refused while it is empty. */
    RECORDED,
    /** As {@link #RECORDED}, for racking only. */
    RECORDED_FOR_RACKING,
    /** Drawn up by the report from the other records; never empty. */
    DRAWN
  }

  private final String code;
  private final Source source;

  Particular(String code, Source source) {
    this.code = code;
    this.source = source;
  }

  public String code() {
    return code;
  }

  public Source source() {
    return source;
  }

  /** Whether a report on this kind of structure needs this particular recorded. */
  public boolean recordedFor(boolean racking) {
    return source == Source.RECORDED || source == Source.RECORDED_FOR_RACKING && racking;
  }
}
