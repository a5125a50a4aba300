package org.bracewalk.app.verdict;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.node.ArrayNode;
import com.fasterxml.jackson.databind.node.JsonNodeFactory;
import com.fasterxml.jackson.databind.node.ObjectNode;
import java.util.List;
import org.bracewalk.app.json.PrettyJson;
import org.bracewalk.core.analysis.AsBuiltAnalysis;
import org.bracewalk.core.analysis.Block;
import org.bracewalk.core.analysis.Freedom;
import org.bracewalk.core.analysis.PlacedBrace;
import org.bracewalk.core.analysis.PlaneAnalysis;
import org.bracewalk.core.analysis.RepairBrace;
import org.bracewalk.core.analysis.RepairMember;
import org.bracewalk.core.analysis.RepairPlan;
import org.bracewalk.core.analysis.RestoreFrameItem;
import org.bracewalk.core.analysis.RestoreItem;
import org.bracewalk.core.analysis.StateAnalysis;
import org.bracewalk.core.model.Brace;
import org.bracewalk.core.model.FrameRef;
import org.bracewalk.core.model.Joint;
import org.bracewalk.core.model.PanelRef;
import org.bracewalk.core.model.PlaneGrid;
import org.bracewalk.core.model.PlaneRole;

/**
 * The JSON verdict of {@code shared/design/check-contract.md}. The contract's fields keep their
 * names and meaning; this class only ever adds:
 *
 * <ul>
 *   <li>{@code lossToleranceExact: false} in a state whose loss tolerance is only a lower bound
 *       (absent when exact);
 *   <li>{@code caution} at the top: the standing caution of {@link Cautions#STANDING};
 *   <li>{@code keepOff} at the top when the analysed state is not rigid: {@link Cautions#keepOff};
 *   <li>{@code keepOffZone} beside it: {@code {"lifts": [...], "bays": [...], "offloadBeside":
 *       true|false}}, the {@link KeepOffZone} of the one {@link Verdict} (absent when nothing need
 *       be kept off);
 *   <li>{@code freedoms} in {@code design} and {@code asBuilt}: the state's freedoms told apart by
 *       kind, {@code {"kind": "sway"|"lost-restraint"|"loose-end", "count": N, "joints": [{"level",
 *       "line"}...], "members": [frame members...], "diagonals": [{"lift", "bay"}...]}}; the counts
 *       add up to {@code degreesOfFreedom}.
 * </ul>
 *
 * The contract's own frame-member fields ({@code criticalMembers}, {@code movingJoints}, {@code
 * unknownFrameMembers}, {@code repair.members}, {@code repair.restoreFrame}) are always written,
 * whether or not the maps had frame lines.
 *
 * Lists keep the engine's order (lift, then bay). Stateless; safe to share.
 */
public final class VerdictJson {

  private static final JsonNodeFactory NODES = JsonNodeFactory.instance;


  public VerdictJson() {}

  /** As {@link #verdict(PlaneAnalysis, PlaneRole)} for a plane of no particular role. */
  public ObjectNode verdict(PlaneAnalysis analysis) {
    return verdict(analysis, PlaneRole.OTHER);
  }

  /** The whole verdict on one plane: support, lifts, bays, design, asBuilt (if any), repair. */
  public ObjectNode verdict(PlaneAnalysis analysis, PlaneRole role) {
    PlaneGrid grid = analysis.grid();
    ObjectNode root = NODES.objectNode();
    root.put("support", grid.support().label());
    root.put("lifts", grid.lifts());
    root.put("bays", grid.bays());
    parts(analysis).putInto(root);
    root.put("caution", Cautions.STANDING);
    putKeepOff(root, Verdict.of(analysis, role));
    return root;
  }

  /** Adds {@code keepOff} (words) and {@code keepOffZone} when the verdict has a zone. */
  public void putKeepOff(ObjectNode target, Verdict verdict) {
    verdict.keepOffZone().ifPresent(z -> {
      target.put("keepOff", Cautions.keepOff(z));
      ObjectNode zone = target.putObject("keepOffZone");
      numbers(zone.putArray("lifts"), z.lifts());
      numbers(zone.putArray("bays"), z.bays());
      zone.put("offloadBeside", z.offloadBeside());
    });
  }

  /** The design, asBuilt and repair parts on their own, for outputs that nest them. */
  public VerdictParts parts(PlaneAnalysis analysis) {
    return new VerdictParts(
        state(analysis.design()), analysis.asBuilt().map(this::asBuilt), repair(analysis.repair()));
  }

  /**
   * One state: rigid, degreesOfFreedom, oneWayOnly, lossTolerance, criticalBraces, criticalMembers,
   * blocks ({@code []} where the frame is incomplete), movingJoints (pinned base; empty on a free
   * plane) and freedoms.
   */
  public ObjectNode state(StateAnalysis s) {
    ObjectNode o = NODES.objectNode();
    o.put("rigid", s.rigid());
    o.put("degreesOfFreedom", s.degreesOfFreedom());
    o.put("oneWayOnly", s.oneWayOnly());
    o.put("lossTolerance", s.lossTolerance());
    if (!s.lossToleranceExact()) {
      o.put("lossToleranceExact", false);
    }
    ArrayNode critical = o.putArray("criticalBraces");
    for (PanelRef p : s.criticalBraces()) {
      critical.add(panel(p));
    }
    ArrayNode blocks = o.putArray("blocks");
    for (Block b : s.blocks()) {
      ObjectNode block = blocks.addObject();
      numbers(block.putArray("lifts"), b.lifts());
      numbers(block.putArray("bays"), b.bays());
      block.put("fixed", b.fixed());
    }
    ArrayNode criticalMembers = o.putArray("criticalMembers");
    for (FrameRef f : s.criticalMembers()) {
      criticalMembers.add(frameMember(f));
    }
    ArrayNode moving = o.putArray("movingJoints");
    for (Joint j : s.movingJoints()) {
      moving.add(joint(j));
    }
    ArrayNode freedoms = o.putArray("freedoms");
    for (Freedom f : s.freedoms()) {
      ObjectNode item = freedoms.addObject();
      item.put("kind", f.kind().label());
      item.put("count", f.count());
      ArrayNode joints = item.putArray("joints");
      f.joints().forEach(j -> joints.add(joint(j)));
      ArrayNode members = item.putArray("members");
      f.members().forEach(m -> members.add(frameMember(m)));
      ArrayNode diagonals = item.putArray("diagonals");
      f.diagonals().forEach(p -> diagonals.add(panel(p)));
    }
    return o;
  }

  /**
   * The as-built state: a state plus unknownPanels, rigidIfUnknownSound, unknownFrameMembers and
   * extraBraces.
   */
  public ObjectNode asBuilt(AsBuiltAnalysis a) {
    ObjectNode o = state(a.state());
    o.put("unknownPanels", a.unknownPanels());
    o.put("rigidIfUnknownSound", a.rigidIfUnknownSound());
    o.put("unknownFrameMembers", a.unknownFrameMembers());
    ArrayNode extra = o.putArray("extraBraces");
    for (PlacedBrace b : a.extraBraces()) {
      extra.add(member(panel(b.panel()), b.brace()));
    }
    return o;
  }

  /**
   * possible, minimum (braces and frame members together), braces, restoreToDesign, members and
   * restoreFrame.
   */
  public ObjectNode repair(RepairPlan r) {
    ObjectNode o = NODES.objectNode();
    o.put("possible", r.possible());
    o.put("minimum", r.minimum());
    ArrayNode braces = o.putArray("braces");
    for (RepairBrace b : r.braces()) {
      ObjectNode item = member(panel(b.panel()), b.brace());
      item.put("inDesign", b.inDesign());
      braces.add(item);
    }
    ArrayNode restore = o.putArray("restoreToDesign");
    for (RestoreItem item : r.restoreToDesign()) {
      ObjectNode node = member(panel(item.panel()), item.missing());
      node.put("neededForRigidity", item.neededForRigidity());
      restore.add(node);
    }
    ArrayNode members = o.putArray("members");
    for (RepairMember m : r.members()) {
      members.add(frameMember(m.member()).put("inDesign", m.inDesign()));
    }
    ArrayNode restoreFrame = o.putArray("restoreFrame");
    for (RestoreFrameItem item : r.restoreFrame()) {
      restoreFrame.add(frameMember(item.member()).put("neededForRigidity", item.neededForRigidity()));
    }
    return o;
  }

  /**
   * {@code {"member": "ledger", "level": L, "bay": B}} or {@code {"member": "standard", "lift": I,
   * "line": J}}: the contract's spelling (scaffold words whatever the plane).
   */
  public static ObjectNode frameMember(FrameRef f) {
    ObjectNode o = NODES.objectNode();
    o.put("member", f.type().label());
    if (f.isLedger()) {
      o.put("level", f.first());
      o.put("bay", f.second());
    } else {
      o.put("lift", f.first());
      o.put("line", f.second());
    }
    return o;
  }

  /** {@code {"level": L, "line": J}}. */
  public static ObjectNode joint(Joint j) {
    ObjectNode o = NODES.objectNode();
    o.put("level", j.level());
    o.put("line", j.line());
    return o;
  }

  /** Pretty-printed JSON ending in a newline (see {@link PrettyJson}). */
  public String write(JsonNode node) {
    return PrettyJson.write(node);
  }

  private static ObjectNode panel(PanelRef p) {
    ObjectNode o = NODES.objectNode();
    o.put("lift", p.lift());
    o.put("bay", p.bay());
    return o;
  }

  private static ObjectNode member(ObjectNode target, Brace b) {
    target.put("diagonal", b.diagonal().symbol());
    target.put("kind", b.kind().label());
    return target;
  }

  private static void numbers(ArrayNode array, List<Integer> values) {
    for (int v : values) {
      array.add(v);
    }
  }
}
