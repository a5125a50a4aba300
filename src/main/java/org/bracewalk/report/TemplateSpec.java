package org.bracewalk.report;

import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Set;
import org.bracewalk.core.model.DefectType;
import org.bracewalk.core.model.PanelState;
import org.bracewalk.core.port.report.Particular;
import org.bracewalk.app.verdict.VerdictKind;
import org.bracewalk.core.port.report.RackDamageLevel;
import org.bracewalk.core.port.report.RepairStepKind;
import org.bracewalk.core.port.report.RepairUrgency;

/**
 * Every key the documents use and the placeholders each may contain. A template file must have
 * every key; a placeholder not listed for its key is an error (a typo would otherwise print as is).
 */
final class TemplateSpec {
  /** The reason codes of an inspection the documents know. */
  static final Set<String> REASONS =
      Set.of("routine", "after-impact", "after-alteration", "handover", "after-severe-weather");

  /** The structure kinds the documents know. */
  static final Set<String> KINDS = Set.of("scaffold", "racking", "other");

  /**
   * The vocabularies of frame members: scaffold (ledger, standard), racking (beam, upright) and a
   * racking upright frame (horizontal, upright).
   */
  static final List<String> FRAME_WORDS = List.of("scaffold", "racking", "upright-frame");

  /** The nouns counted in plain English ({@code count.<noun>.one}, {@code .many}). */
  static final List<String> COUNTED = List.of("action", "urgent", "plane", "motion", "panel",
      "frame-member", "lift", "bay");

  private static final Map<String, Set<String>> KEYS = build();

  private TemplateSpec() {}

  static Map<String, Set<String>> keys() {
    return KEYS;
  }

  private static Map<String, Set<String>> build() {
    Map<String, Set<String>> k = new LinkedHashMap<>();
    // formats and units
    for (String f :
        new String[] {
          "locale", "format.date", "format.datetime", "format.metres", "format.millimetres",
          "format.inches"
        }) {
      k.put(f, Set.of());
    }
    k.put("unit.length.metric", Set.of("metres"));
    k.put("unit.length.imperial", Set.of("feet", "inches"));
    k.put("unit.bow.metric", Set.of("mm"));
    k.put("unit.bow.imperial", Set.of("inches", "mm"));
    k.put("unit.scalebar.metric", Set.of("n"));
    k.put("unit.scalebar.imperial", Set.of("n"));
    // page furniture
    k.put("doc.report.title", Set.of());
    k.put("doc.order.title", Set.of());
    k.put("doc.subtitle", Set.of("site", "structure", "inspection"));
    k.put("draft.mark", Set.of());
    k.put("draft.banner", Set.of("inspection"));
    k.put("footer.page", Set.of("n", "total"));
    k.put("footer.fingerprint", Set.of("fingerprint"));
    k.put("footer.issued", Set.of("issued", "inspection"));
    // particulars
    k.put("heading.particulars", Set.of());
    k.put("particulars.risk.plane", Set.of("plane", "verdict"));
    k.put("particulars.risk.findings", Set.of("count"));
    k.put("particulars.risk.none", Set.of());
    k.put("particulars.action.none", Set.of());
    k.put("particulars.action.order", Set.of("id", "at", "by", "note"));
    k.put("particulars.action.item", Set.of("action", "where", "description", "due", "status"));
    k.put("particulars.action.plane", Set.of("plane"));
    k.put("particulars.action.done", Set.of("at", "by"));
    k.put("particulars.action.outstanding", Set.of());
    k.put("particulars.further.plan", Set.of("actions", "urgent"));
    k.put("particulars.further.none", Set.of());
    for (Particular p : Particular.values()) {
      k.put("particular." + p.code(), Set.of());
    }
    k.put("label.site", Set.of());
    k.put("label.structure", Set.of());
    k.put("label.kind", Set.of());
    k.put("label.inspection", Set.of());
    k.put("label.reason", Set.of());
    k.put("label.design", Set.of());
    k.put("label.status", Set.of());
    k.put("label.units", Set.of());
    k.put("status.finalised", Set.of());
    k.put("status.open", Set.of());
    k.put("units.metric", Set.of());
    k.put("units.imperial", Set.of());
    for (String r : REASONS) {
      k.put("reason." + r, Set.of());
    }
    for (String s : KINDS) {
      k.put("kind." + s, Set.of());
    }
    // summary
    k.put("heading.summary", Set.of());
    k.put("summary.col.plane", Set.of());
    k.put("summary.col.verdict", Set.of());
    k.put("summary.col.dof", Set.of());
    k.put("summary.col.tolerance", Set.of());
    k.put("summary.col.uninspected", Set.of());
    k.put("summary.pair", Set.of("design", "asBuilt"));
    k.put("summary.alert.lost", Set.of("count", "total", "planes"));
    k.put("summary.alert.depends", Set.of("count", "planes"));
    k.put("summary.alert.none", Set.of("total"));
    // page 1: what to do where
    k.put("heading.todo", Set.of());
    k.put("todo.col.plane", Set.of());
    k.put("todo.col.keepoff", Set.of());
    k.put("todo.col.repairs", Set.of());
    k.put("todo.keepoff", Set.of("lifts", "bays"));
    k.put("todo.keepoff.beside", Set.of("lifts", "bays"));
    k.put("todo.keepoff.none", Set.of());
    k.put("todo.repairs", Set.of("count", "urgent", "numbers"));
    k.put("todo.repairs.none", Set.of());
    k.put("summary.others.one", Set.of("n"));
    k.put("summary.others.many", Set.of("n"));
    // numbers and counts in plain English
    k.put("words.series", Set.of("first", "last"));
    for (String noun : new String[] {"lift", "bay", "level", "line", "action"}) {
      k.put("words." + noun + ".one", Set.of("n"));
      k.put("words." + noun + ".many", Set.of("n"));
    }
    k.put("words.lift.every", Set.of());
    k.put("words.bay.every", Set.of());
    for (String noun : COUNTED) {
      k.put("count." + noun + ".one", Set.of("n"));
      k.put("count." + noun + ".many", Set.of("n"));
    }
    k.put("count.urgent.none", Set.of());
    k.put("summary.model", Set.of());
    k.put("tolerance.not-rigid", Set.of());
    k.put("tolerance.at-least", Set.of("n"));
    k.put("summary.alert.keepoff", Set.of("plane", "lifts", "bays"));
    k.put("summary.alert.keepoff.beside", Set.of("plane", "lifts", "bays"));
    k.put("summary.alert.restraint", Set.of("plane", "joints"));
    k.put("summary.alert.loose", Set.of("plane", "joints"));
    for (VerdictKind v : VerdictKind.values()) {
      k.put("verdict." + v.code(), Set.of());
    }
    // cautions
    k.put("heading.cautions", Set.of());
    k.put("caution.lost", Set.of());
    // plane pages
    k.put("heading.plane", Set.of("plane"));
    k.put("plane.verdict", Set.of("verdict", "dof", "designDof", "tolerance", "designTolerance"));
    k.put("plane.grid", Set.of("lifts", "bays", "width", "height", "support"));
    k.put("support.pinned-base", Set.of());
    k.put("support.free", Set.of());
    k.put("plane.part", Set.of("letter", "state", "lifts", "bays"));
    k.put("plane.part.held", Set.of("lifts", "bays"));
    k.put("plane.part.carried", Set.of("lifts"));
    k.put("plane.part.sways", Set.of());
    k.put("plane.part.free", Set.of());
    k.put("plane.design", Set.of("number", "date", "author"));
    k.put("plane.design.no-author", Set.of("number", "date"));
    k.put("plane.critical", Set.of("panels"));
    k.put("plane.critical.none", Set.of());
    k.put("plane.critical.members", Set.of("members"));
    k.put("plane.frame.naming", Set.of());
    k.put("plane.frame.omitted", Set.of("members"));
    k.put("plane.frame.unknown", Set.of("members"));
    k.put("plane.freedom.sway", Set.of("letter", "motions", "levels", "lines"));
    k.put("plane.freedom.lost-restraint", Set.of("joint", "members"));
    k.put("plane.freedom.loose-end", Set.of("joint", "members"));
    k.put("plane.freedom.model", Set.of());
    for (String type : new String[] {"ledger", "standard"}) {
      for (String words : FRAME_WORDS) {
        k.put("frame." + type + "." + words, Set.of());
      }
    }
    k.put("frame.place.ledger", Set.of("member", "level", "bay"));
    k.put("frame.place.standard", Set.of("member", "lift", "line"));
    k.put("frame.joint", Set.of("level", "line"));
    k.put("frame.diagonal", Set.of("panel"));
    k.put("frame.and", Set.of("first", "second"));
    k.put("plane.uninspected", Set.of("panels", "verdict"));
    k.put("plane.repair.one", Set.of());
    k.put("plane.repair.many", Set.of("count"));
    k.put("plane.repair.members.one", Set.of("members"));
    k.put("plane.repair.members.many", Set.of("count", "members"));
    k.put("plane.repair.actions", Set.of("actions"));
    k.put("plane.repair.impossible", Set.of());
    k.put("plane.extra", Set.of("panels"));
    k.put("list.none", Set.of());
    k.put("list.and-more", Set.of("n"));
    k.put("panel.short", Set.of("lift", "bay"));
    k.put("elevation.title", Set.of("scale"));
    k.put("elevation.lift", Set.of("n"));
    k.put("elevation.bay", Set.of("n"));
    k.put("elevation.overall", Set.of("width", "height"));
    // planes that hold their shape with nothing found: one compact table
    k.put("heading.compact", Set.of());
    k.put("compact.intro", Set.of("scale"));
    k.put("compact.grid", Set.of("lifts", "bays", "width", "height", "support"));
    k.put("compact.numbers", Set.of("dof", "designDof", "tolerance", "designTolerance"));
    k.put("mechanism.title", Set.of("part"));
    k.put("mechanism.title.free", Set.of("part"));
    k.put("mechanism.note", Set.of("angle"));
    k.put("mechanism.one-way", Set.of());
    k.put("mechanism.more", Set.of("n"));
    k.put("mechanism.title.motion", Set.of("part"));
    k.put("mechanism.title.motion.free", Set.of("part"));
    k.put("mechanism.title.restraint", Set.of("joint"));
    k.put("mechanism.title.loose", Set.of("joint"));
    k.put("mechanism.note.motion", Set.of("percent"));
    k.put("legend.title", Set.of());
    for (String s :
        new String[] {
          "design", "sound", "damaged-effective", "damaged-ineffective", "missing", "extra",
          "not-inspected", "not-reachable", "opening", "critical", "repair", "repair-new", "part", "tension",
          "frame-damaged",
          "frame-ineffective", "frame-missing", "frame-omitted", "frame-extra",
          "frame-not-inspected", "frame-not-reachable", "lost-restraint", "loose-end"
        }) {
      k.put("legend." + s, Set.of());
    }
    // findings
    k.put("heading.findings", Set.of());
    k.put("findings.col.location", Set.of());
    k.put("findings.col.state", Set.of());
    k.put("findings.col.defect", Set.of());
    k.put("findings.col.measurement", Set.of());
    k.put("findings.col.damage", Set.of());
    k.put("findings.col.note", Set.of());
    k.put("findings.col.photos", Set.of());
    k.put("findings.location", Set.of("plane", "lift", "bay"));
    k.put("findings.location.frame", Set.of("plane", "member"));
    k.put("findings.measurement", Set.of("bow", "gauge", "limit"));
    k.put("findings.measurement.plain", Set.of("bow", "gauge"));
    for (DefectType d : DefectType.values()) {
      k.put("defect." + d.label(), Set.of());
    }
    k.put("findings.recorded", Set.of("at", "by"));
    k.put("findings.none", Set.of());
    k.put("findings.source", Set.of());
    k.put("findings.no-photo", Set.of());
    for (PanelState s : PanelState.values()) {
      k.put("state." + s.label(), Set.of());
    }
    for (RackDamageLevel d : RackDamageLevel.values()) {
      k.put("damage." + d.code(), Set.of("due"));
    }
    // repair plan
    k.put("heading.repairs", Set.of());
    k.put("repairs.intro", Set.of());
    k.put("repairs.none", Set.of());
    k.put("repairs.col.number", Set.of());
    k.put("repairs.col.location", Set.of());
    k.put("repairs.col.action", Set.of());
    k.put("repairs.col.member", Set.of());
    k.put("repairs.col.when", Set.of());
    k.put("repairs.location", Set.of("plane", "lift", "bay"));
    k.put("repairs.location.lifts", Set.of("plane", "lifts"));
    k.put("repairs.location.frame", Set.of("plane", "member"));
    k.put("repairs.location.beside", Set.of("plane", "lifts"));
    k.put("repairs.deviation", Set.of());
    for (RepairStepKind a : RepairStepKind.values()) {
      k.put("action." + a.code(), Set.of());
    }
    for (RepairUrgency p : RepairUrgency.values()) {
      k.put("priority." + p.code(), Set.of("due"));
    }
    for (String d : new String[] {"rising", "falling", "both"}) {
      for (String kind : new String[] {"rigid", "tension-only"}) {
        k.put("member." + d + "." + kind, Set.of());
      }
    }
    k.put("member.none", Set.of());
    k.put("particulars.action.frame", Set.of("plane", "member"));
    // regulations cited, by the site's jurisdiction (Citations)
    k.put("label.jurisdiction", Set.of());
    for (String j : List.of("uk", "us", "eu", "other")) {
      k.put("jurisdiction." + j, Set.of());
    }
    for (String c : List.of("uk.scaffold", "uk.racking", "us.scaffold", "eu.racking",
        "unrecorded")) {
      k.put("cite.particulars." + c, Set.of());
    }
    k.put("cite.particulars.none", Set.of("jurisdiction", "kind"));
    k.put("cite.repairs.us.scaffold", Set.of());
    k.put("findings.source.elsewhere", Set.of());
    // sign-off and digests
    k.put("heading.signoff", Set.of());
    k.put("signoff.text", Set.of());
    k.put("signoff.name", Set.of());
    k.put("signoff.position", Set.of());
    k.put("signoff.signature", Set.of());
    k.put("signoff.date", Set.of());
    k.put("heading.digests", Set.of());
    k.put("digests.intro", Set.of("scheme"));
    k.put("digests.fingerprint", Set.of());
    // repair order
    k.put("order.intro.one", Set.of());
    k.put("order.intro.many", Set.of("count", "rigidity"));
    k.put("order.intro.all", Set.of("count"));
    k.put("order.intro.plain.one", Set.of());
    k.put("order.intro.plain.many", Set.of("count"));
    k.put("order.caution", Set.of());
    k.put("order.safety", Set.of());
    k.put("order.none", Set.of());
    k.put("order.col.number", Set.of());
    k.put("order.col.where", Set.of());
    k.put("order.col.what", Set.of());
    k.put("order.col.locator", Set.of());
    k.put("order.col.done", Set.of());
    k.put("order.done-by", Set.of());
    k.put("order.done-date", Set.of());
    k.put("order.based-on", Set.of("inspection", "date"));
    return Map.copyOf(k);
  }
}
