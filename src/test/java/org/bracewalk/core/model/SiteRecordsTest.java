package org.bracewalk.core.model;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

import java.time.Instant;
import java.time.ZoneId;
import java.util.List;
import org.junit.jupiter.api.Test;

class SiteRecordsTest {
  private static final Instant T = Instant.parse("2025-03-04T07:30:00Z");

  private static Observation observation(PanelState state, Brace member, Double bow, Integer gauge,
      Long supersedes, String reason) {
    return new Observation(0, 1, 2, PanelRef.of(1, 1), state, member, bow, gauge, null, null, T,
        "A. Inspector", supersedes, reason);
  }

  @Test
  void optionalTextBecomesEmptyAndRequiredTextMustBeThereAndTextIsKeptAsGiven() {
    // kept as given: a record read from the store shows what the store holds (the application
    // trims typed text before storing, app.StoredText)
    Site site = new Site(0, " Depot ", null, null, null, ZoneId.of("UTC"), DisplayUnits.METRIC);
    assertThat(site.name()).isEqualTo(" Depot ");
    assertThat(site.clientName()).isEmpty();
    assertThatThrownBy(() -> new Site(0, " ", "", "", "", ZoneId.of("UTC"), DisplayUnits.METRIC))
        .hasMessageContaining("site name");
  }

  @Test
  void aBowNeedsItsGaugeLength() {
    assertThatThrownBy(() -> observation(PanelState.DAMAGED_EFFECTIVE, null, 6.0, null, null, null))
        .hasMessageContaining("gauge length");
    assertThat(observation(PanelState.DAMAGED_EFFECTIVE, null, 6.0, 1000, null, null).bowMm())
        .isEqualTo(6.0);
  }

  @Test
  void aCorrectionMustSayWhyAndAReasonNeedsSomethingToCorrect() {
    assertThatThrownBy(() -> observation(PanelState.SOUND, null, null, null, 5L, " "))
        .hasMessageContaining("observation 5").hasMessageContaining("why");
    assertThatThrownBy(() -> observation(PanelState.SOUND, null, null, null, null, "typo"))
        .hasMessageContaining("no observation to supersede");
  }

  @Test
  void anExtraMemberMustBeNamed() {
    assertThatThrownBy(() -> observation(PanelState.EXTRA, null, null, null, null, null))
        .hasMessageContaining("extra");
  }

  @Test
  void aFinalisedInspectionHasAFinishTimeNotBeforeItsStart() {
    assertThat(new Inspection(0, 1, T, T.plusSeconds(60), "A. Inspector", "", "", "", "",
        InspectionReason.ROUTINE, InspectionStatus.FINALISED, "", "").isFinalised()).isTrue();
    assertThatThrownBy(() -> new Inspection(0, 1, T, T.minusSeconds(1), "A. Inspector", "", "",
        "", "", InspectionReason.ROUTINE, InspectionStatus.FINALISED, "", ""))
        .hasMessageContaining("before");
    assertThatThrownBy(() -> new Inspection(0, 1, T, null, "A. Inspector", "", "", "", "",
        InspectionReason.ROUTINE, InspectionStatus.FINALISED, "", ""))
        .hasMessageContaining("finish time");
  }

  @Test
  void photosAreCopiedInAndOut() {
    byte[] bytes = {1, 2, 3};
    Photo photo = new Photo(0, 1, "p.jpg", "image/jpeg", bytes, T);
    bytes[0] = 9;
    assertThat(photo.data()[0]).isEqualTo((byte) 1);
    photo.data()[1] = 9;
    assertThat(photo.data()[1]).isEqualTo((byte) 2);
    assertThat(photo).isEqualTo(new Photo(0, 1, "p.jpg", "image/jpeg", new byte[] {1, 2, 3}, T));
  }

  @Test
  void gridsRoundToWholeMillimetresAndBack() {
    PlaneGrid grid = new PlaneGrid(1, 2, List.of(2.4, 1.0904), List.of(2.0), Support.PINNED_BASE);
    PlaneGrid rounded = Millimetres.round(grid);
    assertThat(rounded.bayWidths()).containsExactly(2.4, 1.09);
    assertThat(Millimetres.round(rounded)).isEqualTo(rounded);
    assertThatThrownBy(() -> Millimetres.fromMetres(0.0004)).hasMessageContaining("millimetres");
  }

  @Test
  void labelsParseBackAndUnknownOnesAreNamed() {
    for (InspectionReason r : InspectionReason.values()) {
      assertThat(InspectionReason.fromLabel(r.label())).isEqualTo(r);
    }
    assertThatThrownBy(() -> StructureKind.fromLabel("tower")).hasMessageContaining("'tower'");
    assertThatThrownBy(() -> RepairActionKind.fromLabel("weld"))
        .hasMessageContaining("take-out-of-service");
  }
}
