package org.bracewalk.ui.sites;

import static org.assertj.core.api.Assertions.assertThat;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import org.bracewalk.app.AppServices;
import org.bracewalk.core.model.Inspection;
import org.bracewalk.core.model.PlaneRecord;
import org.bracewalk.ui.DemoDatabase;
import org.bracewalk.ui.common.FakeDialogs;
import org.bracewalk.ui.common.Navigator;
import org.junit.jupiter.api.AfterEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** Retiring a plane from the Sites screen: asked why, confirmed, kept for the record. */
class RetirePlaneViewModelTest {
  @TempDir Path dir;
  private AppServices services;
  private final FakeDialogs dialogs = new FakeDialogs();
  private final List<String> opened = new ArrayList<>();
  private final Navigator navigator = (screen, sel) -> opened.add(screen + " " + sel);

  @AfterEach
  void close() {
    services.close();
  }

  private SitesViewModel sitesOf(AppServices s) {
    return new SitesViewModel(s.sites(), s.inspections(), s.analysis(), s.demo(), s.store().location(),
        DemoDatabase.CLOCK, dialogs, navigator, Runnable::run, Runnable::run);
  }

  private OverviewRow row(SitesViewModel vm, String name) {
    return vm.rows().stream().filter(r -> r.name().equals(name)).findFirst().orElseThrow();
  }

  @Test
  void aConfirmedRetirementKeepsThePlaneListedAndLeavesItOutOfTheNextInspection() {
    services = DemoDatabase.withDemo(dir);
    SitesViewModel vm = sitesOf(services);
    vm.selectedProperty().set(row(vm, "spine"));
    dialogs.textAnswers.add(Optional.of("dismantled after the impact"));
    dialogs.confirmAnswers.add(true);
    assertThat(vm.retirePlane()).as(vm.errorProperty().get()).isTrue();
    assertThat(dialogs.asked.get(1)).contains("Retire plane 'spine'?").contains("cannot be undone");
    // the latest inspection started before: it keeps the plane and its verdict
    assertThat(row(vm, "spine").verdictText())
        .endsWith("Holds its shape (#2) \u00b7 retired 2025-03-15 09:00: dismantled after the impact");
    assertThat(vm.statusProperty().get()).contains("Plane 'spine' retired");

    vm.selectedProperty().set(row(vm, "spine"));
    vm.inspectorNameProperty().set("Priya Danvers");
    vm.inspectorPositionProperty().set("racking inspector");
    vm.competentPersonProperty().set("Priya Danvers");
    vm.shiftProperty().set("day");
    vm.storageSafetyPersonProperty().set("Sam Odell");
    assertThat(vm.startInspection()).as(vm.errorProperty().get()).isTrue();
    Inspection started = services.inspections().inspections(1).get(2);
    assertThat(services.inspections().planesOf(started.id())).extracting(PlaneRecord::name)
        .doesNotContain("spine");
    // the walk-round opens on a plane the inspection covers, not on the retired one
    long spine = spineOf(services).id();
    assertThat(opened.get(0)).doesNotContain("plane=" + spine + ",").contains("WALK");
    assertThat(services.inspections().planesOf(1)).extracting(PlaneRecord::name).contains("spine");
    vm.refresh();
    assertThat(row(vm, "spine").verdictText()).isEqualTo("retired 2025-03-15 09:00: dismantled after the impact");
  }

  @Test
  void declinedOrWithoutAReasonNothingIsRetired() {
    services = DemoDatabase.withDemo(dir);
    SitesViewModel vm = sitesOf(services);
    long spine = spineOf(services).id();
    vm.selectedProperty().set(row(vm, "spine"));
    dialogs.textAnswers.add(Optional.of("typo"));
    dialogs.confirmAnswers.add(false);
    assertThat(vm.retirePlane()).isFalse();
    dialogs.textAnswers.add(Optional.of("   "));
    assertThat(vm.retirePlane()).isFalse();
    assertThat(vm.errorProperty().get()).contains("give the reason");
    vm.selectedProperty().set(row(vm, "Aisle C racking run"));
    assertThat(vm.retirePlane()).isFalse();
    assertThat(vm.errorProperty().get()).isEqualTo("Select the plane to retire first.");
    assertThat(services.sites().retirement(spine)).isEmpty();
  }

  /** The plane named "spine" of structure 1 (the demo's racking run). */
  private static PlaneRecord spineOf(AppServices services) {
    return services.sites().planes(1).stream()
        .filter(p -> p.name().equals("spine"))
        .findFirst()
        .orElseThrow();
  }
}
