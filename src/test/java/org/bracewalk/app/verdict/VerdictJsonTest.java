package org.bracewalk.app.verdict;

import static org.assertj.core.api.Assertions.assertThat;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.databind.node.ObjectNode;
import java.util.List;
import java.util.Optional;
import org.bracewalk.core.analysis.AsBuiltAnalysis;
import org.bracewalk.core.analysis.Block;
import org.bracewalk.core.analysis.Freedom;
import org.bracewalk.core.analysis.FreedomKind;
import org.bracewalk.core.analysis.PlacedBrace;
import org.bracewalk.core.analysis.PlaneAnalysis;
import org.bracewalk.core.analysis.RepairBrace;
import org.bracewalk.core.analysis.RepairMember;
import org.bracewalk.core.analysis.RepairPlan;
import org.bracewalk.core.analysis.RestoreFrameItem;
import org.bracewalk.core.analysis.RestoreItem;
import org.bracewalk.core.analysis.StateAnalysis;
import org.bracewalk.core.model.Brace;
import org.bracewalk.core.model.Diagonal;
import org.bracewalk.core.model.FrameRef;
import org.bracewalk.core.model.Joint;
import org.bracewalk.core.model.PanelRef;
import org.bracewalk.core.model.PlaneGrid;
import org.bracewalk.core.model.Support;
import org.junit.jupiter.api.Test;

class VerdictJsonTest {
  private final VerdictJson json = new VerdictJson();
  private final ObjectMapper mapper = new ObjectMapper();

  private static final PlaneGrid GRID = PlaneGrid.uniform(3, 3, Support.FREE);

  private static StateAnalysis freeRigid(boolean exact) {
    return new StateAnalysis(
        true, 0, false, 1, exact, List.of(), List.of(new Block(List.of(1, 2, 3), List.of(1, 2, 3), false)));
  }

  private static StateAnalysis oneWay() {
    return new StateAnalysis(
        false, 0, true, -1, true, List.of(PanelRef.of(2, 1)), List.of(new Block(List.of(1, 2, 3), List.of(1, 2, 3), false)));
  }

  @Test
  void aStateHasExactlyTheContractFieldsInContractOrder() {
    ObjectNode o = json.state(freeRigid(true));

    assertThat(o.properties().stream().map(e -> e.getKey()).toList())
        .containsExactly("rigid", "degreesOfFreedom", "oneWayOnly", "lossTolerance", "criticalBraces", "blocks",
            // check-contract.md "Frame members", then the added freedoms
            "criticalMembers", "movingJoints", "freedoms");
  }

  @Test
  void lossToleranceExactIsAddedOnlyWhenTheToleranceIsALowerBound() {
    assertThat(json.state(freeRigid(true)).has("lossToleranceExact")).isFalse();
    assertThat(json.state(freeRigid(false)).get("lossToleranceExact").asBoolean()).isFalse();
  }

  @Test
  void asBuiltAddsUnknownPanelsTheOptimisticVerdictAndExtraBraces() {
    AsBuiltAnalysis a =
        new AsBuiltAnalysis(
            oneWay(), 2, true, List.of(new PlacedBrace(PanelRef.of(1, 3), Brace.tension(Diagonal.FALLING))));

    ObjectNode o = json.asBuilt(a);

    assertThat(o.get("oneWayOnly").asBoolean()).isTrue();
    assertThat(o.get("unknownPanels").asInt()).isEqualTo(2);
    assertThat(o.get("rigidIfUnknownSound").asBoolean()).isTrue();
    assertThat(o.get("extraBraces").toString())
        .isEqualTo("[{\"lift\":1,\"bay\":3,\"diagonal\":\"\\\\\",\"kind\":\"tension-only\"}]");
  }

  @Test
  void repairListsBracesAndRestoreItemsWithTheContractSpelling() {
    RepairPlan plan =
        new RepairPlan(
            true,
            List.of(new RepairBrace(PanelRef.of(2, 1), Brace.rigid(Diagonal.RISING), false)),
            List.of(new RestoreItem(PanelRef.of(3, 2), Brace.tension(Diagonal.BOTH), false)));

    ObjectNode o = json.repair(plan);

    assertThat(o.toString())
        .isEqualTo(
            "{\"possible\":true,\"minimum\":1,"
                + "\"braces\":[{\"lift\":2,\"bay\":1,\"diagonal\":\"/\",\"kind\":\"rigid\",\"inDesign\":false}],"
                + "\"restoreToDesign\":[{\"lift\":3,\"bay\":2,\"diagonal\":\"X\",\"kind\":\"tension-only\","
                + "\"neededForRigidity\":false}],\"members\":[],\"restoreFrame\":[]}");
  }

  /** check-contract.md, "Frame members": the spelling of members, joints and the repair's fields. */
  @Test
  void frameMembersJointsAndFreedomsHaveTheContractSpelling() {
    StateAnalysis s = new StateAnalysis(false, 3, false, -1, true, List.of(PanelRef.of(1, 1)), List.of(),
        List.of(FrameRef.ledger(1, 2), FrameRef.standard(2, 0)),
        List.of(new Joint(1, 0), new Joint(2, 1)),
        List.of(
            new Freedom(FreedomKind.SWAY, 1, List.of(new Joint(2, 1)), List.of(), List.of()),
            new Freedom(FreedomKind.LOST_RESTRAINT, 1, List.of(new Joint(1, 0)),
                List.of(FrameRef.standard(1, 0), FrameRef.standard(2, 0)), List.of()),
            new Freedom(FreedomKind.LOOSE_END, 1, List.of(new Joint(1, 3)), List.of(), List.of(PanelRef.of(1, 3)))),
        false);

    ObjectNode o = json.state(s);

    assertThat(o.get("criticalMembers").toString()).isEqualTo(
        "[{\"member\":\"ledger\",\"level\":1,\"bay\":2},{\"member\":\"standard\",\"lift\":2,\"line\":0}]");
    assertThat(o.get("movingJoints").toString()).isEqualTo("[{\"level\":1,\"line\":0},{\"level\":2,\"line\":1}]");
    assertThat(o.get("blocks").toString()).isEqualTo("[]");
    assertThat(o.get("freedoms").toString()).isEqualTo("["
        + "{\"kind\":\"sway\",\"count\":1,\"joints\":[{\"level\":2,\"line\":1}],\"members\":[],\"diagonals\":[]},"
        + "{\"kind\":\"lost-restraint\",\"count\":1,\"joints\":[{\"level\":1,\"line\":0}],"
        + "\"members\":[{\"member\":\"standard\",\"lift\":1,\"line\":0},{\"member\":\"standard\",\"lift\":2,\"line\":0}],"
        + "\"diagonals\":[]},"
        + "{\"kind\":\"loose-end\",\"count\":1,\"joints\":[{\"level\":1,\"line\":3}],\"members\":[],"
        + "\"diagonals\":[{\"lift\":1,\"bay\":3}]}]");

    RepairPlan plan = new RepairPlan(true, List.of(new RepairBrace(PanelRef.of(2, 1), Brace.rigid(Diagonal.RISING), true)),
        List.of(), List.of(new RepairMember(FrameRef.ledger(1, 2), true)),
        List.of(new RestoreFrameItem(FrameRef.ledger(1, 2), true), new RestoreFrameItem(FrameRef.standard(1, 1), false)));
    ObjectNode r = json.repair(plan);
    // minimum counts braces and members together
    assertThat(r.get("minimum").asInt()).isEqualTo(2);
    assertThat(r.get("members").toString()).isEqualTo("[{\"member\":\"ledger\",\"level\":1,\"bay\":2,\"inDesign\":true}]");
    assertThat(r.get("restoreFrame").toString()).isEqualTo(
        "[{\"member\":\"ledger\",\"level\":1,\"bay\":2,\"neededForRigidity\":true},"
            + "{\"member\":\"standard\",\"lift\":1,\"line\":1,\"neededForRigidity\":false}]");

    AsBuiltAnalysis a = new AsBuiltAnalysis(s, 0, false, List.of(), 4);
    assertThat(json.asBuilt(a).get("unknownFrameMembers").asInt()).isEqualTo(4);
  }

  @Test
  void thePartsAreTheSameNodesTheWholeVerdictCarries() {
    RepairPlan plan = new RepairPlan(true, List.of(), List.of());
    PlaneAnalysis analysis =
        new PlaneAnalysis(GRID, freeRigid(true), Optional.of(new AsBuiltAnalysis(oneWay(), 0, false, List.of())), plan);

    ObjectNode whole = json.verdict(analysis);
    VerdictParts parts = json.parts(analysis);

    assertThat(whole.get("design")).isEqualTo(parts.design());
    assertThat(whole.get("asBuilt")).isEqualTo(parts.asBuilt().orElseThrow());
    assertThat(whole.get("repair")).isEqualTo(parts.repair());
    assertThat(parts.putInto(mapper.createObjectNode()).properties().stream().map(e -> e.getKey()).toList())
        .containsExactly("design", "asBuilt", "repair");
    assertThat(whole.get("support").asText()).isEqualTo("free");
    // sways one way only: the engine names no block, so every lift and bay is kept off
    assertThat(whole.get("keepOff").asText()).contains("lifts 1-3, bays 1-3");
    assertThat(whole.get("keepOffZone").get("lifts").toString()).isEqualTo("[1,2,3]");
    assertThat(whole.get("caution").asText()).isEqualTo(Cautions.STANDING);
  }

  @Test
  void withoutAnAsBuiltStateThereIsNoAsBuiltPart() {
    PlaneAnalysis analysis = new PlaneAnalysis(GRID, freeRigid(true), Optional.empty(), new RepairPlan(true, List.of(), List.of()));

    assertThat(json.verdict(analysis).has("asBuilt")).isFalse();
    assertThat(json.verdict(analysis).has("keepOff")).isFalse();
    assertThat(json.parts(analysis).asBuilt()).isEmpty();
  }

  @Test
  void theWriterPrettyPrintsParseableJsonWithATrailingNewline() throws Exception {
    PlaneAnalysis analysis = new PlaneAnalysis(GRID, oneWay(), Optional.empty(), new RepairPlan(false, List.of(), List.of()));
    ObjectNode v = json.verdict(analysis);
    v.put("quote", "a \"quoted\" word\nand a new line");

    String text = json.write(v);

    assertThat(text).endsWith("}\n").contains("\n  \"lifts\": 3,\n").contains("\"lifts\": [1, 2, 3]");
    JsonNode back = mapper.readTree(text);
    assertThat(back).isEqualTo(v);
  }
}
