package org.bracewalk.app;

import java.util.Optional;
import java.util.Set;
import org.bracewalk.core.model.Jurisdiction;
import org.bracewalk.core.model.StructureKind;
import org.bracewalk.core.port.report.SiteRules;

/**
 * What the rules of a site's jurisdiction say about the days between routine inspections of a
 * structure, worded for a person about to set them. It cites only what the report of that site
 * cites ({@link SiteRules#cited}); where that is nothing it names no regulation and defers to the
 * local codes. Sources and how sure they are: shared/design/trade-facts.md, "When inspections
 * happen".
 *
 * <ul>
 *   <li>UK scaffold: a working platform is inspected at least every 7 days (Work at Height
 *       Regulations 2005, reg. 12; read);
 *   <li>US scaffold: a competent person inspects before each shift (29 CFR 1926.451(f)(3); read),
 *       which no number of days between recorded inspections replaces;
 *   <li>racking (UK: HSE HSG76, read, and EN 15635, secondary; EU: EN 15635): visual inspections
 *       weekly or as the risk assessment sets, an expert inspection at least every 12 months;
 *   <li>anything else: no rule named; more than {@link #WEEK} days is worth a second look (common
 *       practice, as the default interval).
 * </ul>
 */
public final class IntervalRules {
  /** Days in the interval the UK rules and the racking guidance name, and the default. */
  public static final int WEEK = 7;

  private IntervalRules() {}

  /**
   * A note to confirm before {@code days} are kept for the structure, or empty when the site's
   * rules (or, where none is named, common practice) have nothing to say against them.
   *
   * @param heading a short title for a confirmation box
   * @param text the note: the rule and its source where the site's jurisdiction has one, the
   *     local codes otherwise
   */
  public record Note(String heading, String text) {}

  /** The report's word for a structure kind, as {@link SiteRules} takes it. */
  static String reportKind(StructureKind kind) {
    return switch (kind) {
      case SCAFFOLD -> "scaffold";
      case RACKING_RUN -> "racking";
      case OTHER_FRAME -> "other";
    };
  }

  /** The note for {@code days} between routine inspections of {@code structureName}. */
  public static Optional<Note> note(Jurisdiction jurisdiction, StructureKind kind,
      String structureName, int days) {
    Set<SiteRules.Source> cited = SiteRules.cited(jurisdiction, reportKind(kind));
    String keep = "Keep " + days + (days == 1 ? " day" : " days") + " for '" + structureName + "'";
    if (cited.contains(SiteRules.Source.WAHR_2005)) {
      return days <= WEEK ? Optional.empty() : Optional.of(new Note("Longer than 7 days",
          "In the United Kingdom a scaffold platform from which a person could fall 2 m or more"
              + " is inspected at least every 7 days (Work at Height Regulations 2005, reg. 12)."
              + " " + keep + " only where those rules allow it."));
    }
    if (cited.contains(SiteRules.Source.CFR_1926_451)) {
      return days <= 1 ? Optional.empty() : Optional.of(new Note("Inspect before each shift",
          "In the United States a competent person inspects a scaffold before each shift, and after"
              + " anything that could affect its structural integrity (29 CFR 1926.451(f)(3))."
              + " The days set here count only the inspections recorded in Bracewalk: " + keep
              + " only with that check before each shift made as well."));
    }
    if (cited.contains(SiteRules.Source.HSG76) || cited.contains(SiteRules.Source.EN_15635)) {
      String source = cited.contains(SiteRules.Source.HSG76) ? "HSE HSG76; EN 15635" : "EN 15635";
      return days <= WEEK ? Optional.empty() : Optional.of(new Note("Longer than 7 days",
          "Storage racking is given a visual inspection weekly, or as the risk assessment sets,"
              + " and an expert inspection at least every 12 months (" + source + "). " + keep
              + " only where the risk assessment sets it."));
    }
    if (days <= WEEK) {
      return Optional.empty();
    }
    String whose = jurisdiction == Jurisdiction.OTHER
        ? "The site records no jurisdiction, so Bracewalk names no rule for the days between"
            + " inspections."
        : "Bracewalk holds no rule of the " + jurisdiction.title() + " for the days between"
            + " inspections of this kind of structure, so it names none.";
    return Optional.of(new Note("Longer than 7 days",
        whose + " " + keep + " only where the local codes that apply allow it."));
  }
}
