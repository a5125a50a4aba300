package org.bracewalk.report;

import java.util.Set;
import org.bracewalk.core.model.Jurisdiction;
import org.bracewalk.core.port.report.ReportHeader;
import org.bracewalk.core.port.report.SiteRules;

/**
 * The sentences of a report that cite regulations, chosen by the site's jurisdiction and the kind
 * of structure ({@link SiteRules}): a report cites its own jurisdiction's rules only.
 */
final class Citations {
  private Citations() {}

  /** Under the particulars: whose rules ask for them, or that none is cited and why. */
  static String particulars(Wording w, ReportHeader h) {
    Set<SiteRules.Source> cited = h.cited();
    if (cited.contains(SiteRules.Source.WAHR_2005)) {
      return w.text("cite.particulars.uk.scaffold");
    }
    if (cited.contains(SiteRules.Source.CFR_1926_451)) {
      return w.text("cite.particulars.us.scaffold");
    }
    if (cited.contains(SiteRules.Source.HSG76)) {
      return w.text("cite.particulars.uk.racking");
    }
    if (cited.contains(SiteRules.Source.EN_15635)) {
      return w.text("cite.particulars.eu.racking");
    }
    if (h.jurisdiction() == Jurisdiction.OTHER) {
      return w.text("cite.particulars.unrecorded");
    }
    return w.format("cite.particulars.none", "jurisdiction",
        w.code("jurisdiction", h.jurisdiction().label()), "kind",
        w.code("kind", h.structureKind()));
  }

  /** Under the findings of a racking run: where the bow limits come from. */
  static String bowLimits(Wording w, ReportHeader h) {
    return w.text(h.cited().contains(SiteRules.Source.EN_15635)
        ? "findings.source" : "findings.source.elsewhere");
  }

  /** The repair plan's opening, with the US scaffold rule on the four actions where it applies. */
  static String repairs(Wording w, ReportHeader h) {
    return h.cited().contains(SiteRules.Source.CFR_1926_451)
        ? w.text("repairs.intro") + " " + w.text("cite.repairs.us.scaffold")
        : w.text("repairs.intro");
  }
}
