package org.bracewalk.ui.sites;

import static org.assertj.core.api.Assertions.assertThat;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import org.bracewalk.app.AppServices;
import org.bracewalk.bench.DemoWalk;
import org.bracewalk.ui.DemoDatabase;
import org.bracewalk.ui.common.FakeDialogs;
import org.bracewalk.ui.common.Navigator;
import org.bracewalk.ui.common.ScreenId;
import org.bracewalk.ui.common.Selection;
import org.bracewalk.app.verdict.VerdictKind;
import org.junit.jupiter.api.AfterEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import java.util.Optional;
import org.bracewalk.core.model.Inspection;
import org.bracewalk.core.model.PlaneRecord;

class SitesViewModelTest {
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
  void anEmptyDatabaseOffersTheDemoAndLoadingItFillsTheOverview() {
    services = DemoDatabase.empty(dir);
    SitesViewModel vm = sitesOf(services);
    assertThat(vm.emptyProperty().get()).isTrue();
    assertThat(vm.loadDemo()).isTrue();
    assertThat(vm.emptyProperty().get()).isFalse();
    assertThat(vm.rows()).extracting(OverviewRow::name)
        .contains("Larkspur Depot", "Aisle C racking run", "frame 2", "North facade scaffold", "north facade");
  }

  @Test
  void theOverviewIsReadAndTheDemoLoadedOnTheBackgroundExecutorAndShownThroughTheUiOne() {
    services = DemoDatabase.empty(dir);
    List<Runnable> background = new ArrayList<>();
    List<Runnable> ui = new ArrayList<>();
    SitesViewModel vm = new SitesViewModel(services.sites(), services.inspections(), services.analysis(),
        services.demo(), services.store().location(), DemoDatabase.CLOCK, dialogs, navigator, ui::add, background::add);
    // nothing read on the calling (toolkit) thread; no demo offer before the database is read
    assertThat(vm.loadingProperty().get()).isTrue();
    assertThat(vm.emptyProperty().get()).isFalse();
    background.remove(0).run();
    ui.remove(0).run();
    assertThat(vm.emptyProperty().get()).isTrue();
    assertThat(vm.loadingProperty().get()).isFalse();
    List<String> after = new ArrayList<>();
    assertThat(vm.loadDemo(() -> after.add("rows shown"))).isTrue();
    assertThat(vm.loadDemo()).isFalse(); // one load at a time
    assertThat(services.sites().sites()).isEmpty(); // not yet: it waits on the background executor
    assertThat(vm.statusProperty().get()).startsWith("Loading the demo site");
    background.remove(0).run();
    assertThat(services.sites().sites()).hasSize(1);
    ui.remove(0).run(); // the status, then the overview is read again
    background.remove(0).run();
    assertThat(vm.rows()).isEmpty();
    ui.remove(0).run();
    assertThat(vm.rows()).extracting(OverviewRow::name).contains("Larkspur Depot");
    assertThat(after).containsExactly("rows shown");
    assertThat(background).isEmpty();
    assertThat(ui).isEmpty();
  }

  @Test
  void startingAnInspectionWritesOnTheBackgroundExecutorOneWriteAtATime() {
    services = DemoDatabase.withDemo(dir);
    List<Runnable> background = new ArrayList<>();
    SitesViewModel vm = new SitesViewModel(services.sites(), services.inspections(), services.analysis(),
        services.demo(), services.store().location(), DemoDatabase.CLOCK, dialogs, navigator, Runnable::run,
        background::add);
    background.remove(0).run(); // the overview
    vm.selectedProperty().set(row(vm, "north facade"));
    vm.inspectorNameProperty().set("Rowan Test");
    vm.inspectorPositionProperty().set("Scaffold inspector");
    vm.competentPersonProperty().set("Rowan Test");
    vm.shiftProperty().set("day");
    long structure = row(vm, "north facade").structureId();
    int before = services.inspections().inspections(structure).size();
    dialogs.confirmAnswers.add(true); // the last look: start
    assertThat(vm.startInspection()).isTrue();
    // nothing written on the calling (toolkit) thread, and a second press starts no second inspection
    assertThat(services.inspections().inspections(structure)).hasSize(before);
    assertThat(vm.startInspection()).isFalse();
    assertThat(vm.statusProperty().get()).startsWith("Still saving");
    assertThat(opened).isEmpty();
    background.remove(0).run();
    assertThat(services.inspections().inspections(structure)).hasSize(before + 1);
    assertThat(opened).singleElement().asString().startsWith("WALK");
    assertThat(background).isEmpty();
  }

  @Test
  void eachPlaneShowsItsLatestVerdictAndEachStructureWhenItIsDue() {
    services = DemoDatabase.withDemo(dir);
    SitesViewModel vm = sitesOf(services);
    // the demo's after-impact inspection of the racking run (2025-03-05) lost frame 2
    assertThat(row(vm, "frame 2").verdict()).isEqualTo(VerdictKind.LOST);
    assertThat(row(vm, "frame 1").verdict()).isEqualTo(VerdictKind.HOLDS);
    OverviewRow racking = row(vm, "Aisle C racking run");
    assertThat(racking.verdict()).isEqualTo(VerdictKind.LOST);
    // last finalised 2025-03-05 + 7 days (WAHR 2005 reg. 12 interval) = 2025-03-12 < today 2025-03-15
    assertThat(racking.lastInspected()).startsWith("2025-03-05");
    assertThat(racking.due()).isEqualTo(OverviewRow.Due.OVERDUE);
    assertThat(racking.nextDue()).isEqualTo("since 2025-03-12");
    assertThat(racking.interval()).isEqualTo("7 days");
    // the facade's routine inspection (2025-02-28) found a ledger taken out for access
    OverviewRow scaffold = row(vm, "North facade scaffold");
    assertThat(scaffold.due()).isEqualTo(OverviewRow.Due.OVERDUE);
    assertThat(row(vm, "north facade").verdict()).isEqualTo(VerdictKind.LOST_RESTRAINT);
  }

  @Test
  void theInspectionIntervalIsASettingPerStructureAndMovesTheDueDate() {
    services = DemoDatabase.withDemo(dir);
    SitesViewModel vm = sitesOf(services);
    vm.selectedProperty().set(row(vm, "frame 2"));
    // last finalised 2025-03-05; today 2025-03-15: 7 days overdue, 14 days due on 2025-03-19
    dialogs.textAnswers.push(java.util.Optional.of(" 14 "));
    // the demo site is in the UK: racking has a visual inspection weekly (HSE HSG76 paras
    // 643-646, read; trade-facts.md), so 14 days is kept only once confirmed
    dialogs.confirmAnswers.push(true);
    assertThat(vm.changeInterval()).isTrue();
    assertThat(dialogs.asked.get(dialogs.asked.size() - 1)).contains("HSG76")
        .doesNotContain("Work at Height").doesNotContain("1926");
    OverviewRow racking = row(vm, "Aisle C racking run");
    assertThat(racking.interval()).isEqualTo("14 days");
    assertThat(racking.nextDue()).isEqualTo("2025-03-19");
    // in time by the date, but frame 2 has lost rigidity: a warning mark, never the tick of "in time"
    assertThat(racking.due()).isEqualTo(OverviewRow.Due.LOST_RIGIDITY);
    assertThat(racking.due().words()).doesNotContain("\u2713").contains("lost rigidity");
    assertThat(vm.statusProperty().get()).contains("every 14 days; next due 2025-03-19");
    assertThat(vm.selectedProperty().get().name()).isEqualTo("frame 2");
    // not a number, and out of range: refused by name, nothing changed
    dialogs.textAnswers.push(java.util.Optional.of("fortnight"));
    assertThat(vm.changeInterval()).isFalse();
    assertThat(vm.errorProperty().get()).contains("'fortnight' is not a whole number");
    dialogs.textAnswers.push(java.util.Optional.of("400"));
    assertThat(vm.changeInterval()).isFalse();
    assertThat(vm.errorProperty().get()).contains("1 to 366");
    assertThat(row(vm, "Aisle C racking run").interval()).isEqualTo("14 days");
    // a scaffold over 7 days (WAHR 2005 reg. 12) only once confirmed
    vm.selectedProperty().set(row(vm, "North facade scaffold"));
    dialogs.textAnswers.push(java.util.Optional.of("10"));
    dialogs.confirmAnswers.push(false);
    assertThat(vm.changeInterval()).isFalse();
    assertThat(dialogs.asked.get(dialogs.asked.size() - 1)).contains("reg. 12")
        .doesNotContain("1926").doesNotContain("HSG76");
    assertThat(row(vm, "North facade scaffold").interval()).isEqualTo("7 days");
    dialogs.textAnswers.push(java.util.Optional.of("10"));
    dialogs.confirmAnswers.push(true);
    assertThat(vm.changeInterval()).isTrue();
    assertThat(row(vm, "North facade scaffold").interval()).isEqualTo("10 days");
    assertThat(services.sites().structure(row(vm, "North facade scaffold").structureId()).inspectionIntervalDays())
        .isEqualTo(10);
  }

  @Test
  void aPlaneAddedAfterTheLatestInspectionIsShownAsNotPartOfIt() {
    services = DemoDatabase.withDemo(dir);
    var frame2 = services.sites().planes(1).stream().filter(p -> p.name().equals("frame 2")).findFirst().orElseThrow();
    var design = services.sites().currentDesign(frame2.id()).design();
    services.sites().createPlane(
        new org.bracewalk.core.model.PlaneRecord(0, 1, "west return", frame2.grid()),
        "Ines Carrow", java.time.LocalDate.of(2025, 3, 15), "", design);
    SitesViewModel vm = sitesOf(services);
    // the demo's inspection 2 covers the planes fixed when it started: not this one
    assertThat(row(vm, "west return").verdict()).isEqualTo(VerdictKind.NOT_INSPECTED);
    assertThat(row(vm, "west return").verdictText()).contains("added after inspection 2 started");
    assertThat(row(vm, "frame 2").verdict()).isEqualTo(VerdictKind.LOST);
  }

  @Test
  void anOpenWalkRoundShowsHowFarItHasGot() {
    services = DemoDatabase.withDemo(dir);
    DemoWalk.record(services, 20);
    SitesViewModel vm = sitesOf(services);
    assertThat(row(vm, "north facade").verdictText()).contains("open #4: 20 of 50 marked");
    // the second plane of the open inspection, not yet walked, says so (issue 12, item 5)
    assertThat(row(vm, "east end frame").verdictText()).contains("open #4: 0 of 5 panels looked at")
        .doesNotContain("marked");
    // the finalised inspection's lost restraint stays until a later one has shown otherwise
    assertThat(row(vm, "north facade").verdict()).isEqualTo(VerdictKind.LOST_RESTRAINT);
  }

  @Test
  void anOpenInspectionNeverHidesAKnownLostRigidityUntilItHasShownOtherwise() {
    services = DemoDatabase.withDemo(dir);
    SitesViewModel before = sitesOf(services);
    assertThat(row(before, "frame 2").verdict()).isEqualTo(VerdictKind.LOST);
    long racking = row(before, "Aisle C racking run").structureId();
    long frame2 = row(before, "frame 2").planeId();
    // the attack: a new inspection of the racking run, nothing recorded on frame 2 yet
    var open = services.inspections().start(racking, new org.bracewalk.app.NewInspection("Priya Danvers",
        "Storage equipment inspector", "Priya Danvers", "day shift", "Ola Brandt",
        org.bracewalk.core.model.InspectionReason.ROUTINE, null, null));
    SitesViewModel started = sitesOf(services);
    assertThat(row(started, "frame 2").verdict()).isEqualTo(VerdictKind.LOST);
    assertThat(row(started, "frame 2").verdictText()).startsWith(VerdictKind.LOST.headline() + " (#2)");
    assertThat(row(started, "Aisle C racking run").verdict()).isEqualTo(VerdictKind.LOST);

    // one sound panel recorded: the rest unseen, so the open verdict depends on them; the known
    // lost rigidity still shows, with how far the open walk-round has got
    services.inspections().recordObservation(open.id(), org.bracewalk.app.NewObservation.of(frame2,
        org.bracewalk.core.model.PanelRef.of(3, 1), org.bracewalk.core.model.PanelState.SOUND, "Priya Danvers"));
    SitesViewModel marked = sitesOf(services);
    assertThat(row(marked, "frame 2").verdict()).isEqualTo(VerdictKind.LOST);
    assertThat(row(marked, "frame 2").verdictText()).contains("not yet cleared")
        .contains("open #" + open.id() + ": 1 of 5 marked");
    // a plane the open inspection has not touched keeps its last finalised verdict, not "not inspected"
    assertThat(row(marked, "frame 1").verdict()).isEqualTo(VerdictKind.HOLDS);
  }

  @Test
  void rackingNeedsThePersonResponsibleForStorageSafety() {
    services = DemoDatabase.withDemo(dir);
    SitesViewModel vm = sitesOf(services);
    vm.selectedProperty().set(row(vm, "frame 1"));
    vm.inspectorNameProperty().set("Ada Quill");
    vm.inspectorPositionProperty().set("Racking inspector");
    vm.competentPersonProperty().set("Ada Quill");
    vm.shiftProperty().set("day");
    assertThat(vm.startInspection()).isFalse();
    assertThat(vm.errorProperty().get()).startsWith("Storage safety person (racking): empty.");
  }

  @Test
  void startingAnInspectionNeedsTheInspectorAndOpensTheWalkRound() {
    services = DemoDatabase.withDemo(dir);
    SitesViewModel vm = sitesOf(services);
    vm.selectedProperty().set(row(vm, "north facade"));
    assertThat(vm.startInspection()).isFalse();
    assertThat(vm.errorProperty().get()).startsWith("Inspector, Position, Competent person, Shift: empty.");
    vm.inspectorNameProperty().set("  Ada Quill ");
    vm.inspectorPositionProperty().set("Scaffold inspector");
    vm.competentPersonProperty().set("Ada Quill");
    assertThat(vm.startInspection()).isFalse();
    assertThat(vm.errorProperty().get()).startsWith("Shift: empty. The report needs it");
    // the demo's one inspection of the facade scaffold
    assertThat(services.inspections().inspections(row(vm, "north facade").structureId())).hasSize(1);
    vm.shiftProperty().set("day");
    dialogs.confirmAnswers.add(true); // the last look: start
    assertThat(vm.startInspection()).isTrue();
    var started = services.inspections().inspections(row(vm, "north facade").structureId())
        .subList(1, 2);
    assertThat(started).singleElement().satisfies(i -> assertThat(i.inspectorName()).isEqualTo("Ada Quill"));
    OverviewRow facade = row(vm, "north facade");
    assertThat(opened).containsExactly(
        ScreenId.WALK + " " + new Selection(facade.structureId(), facade.planeId(), started.get(0).id()));
  }

  // ---- retiring a plane: asked why, confirmed, kept for the record ----

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
    dialogs.confirmAnswers.add(true); // the last look: start
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

  // ---- the start form: a last look, and an error that follows the fields ----

  @Test
  void startShowsEveryValueForALastLookAndDecliningStartsNothing() {
    services = DemoDatabase.withDemo(dir);
    SitesViewModel vm = sitesOf(services);
    vm.selectedProperty().set(row(vm, "frame 1"));
    vm.inspectorNameProperty().set("Ada Quill");
    vm.inspectorPositionProperty().set("Racking inspector, Quill Ltd");
    vm.competentPersonProperty().set("Bo Lindqvist");
    vm.shiftProperty().set("night");
    vm.storageSafetyPersonProperty().set("Sam Odell");
    vm.reasonProperty().set(org.bracewalk.core.model.InspectionReason.AFTER_IMPACT);
    long structure = row(vm, "frame 1").structureId();
    int before = services.inspections().inspections(structure).size();
    dialogs.confirmAnswers.add(false);
    assertThat(vm.startInspection()).isFalse();
    String look = dialogs.asked.get(dialogs.asked.size() - 1);
    assertThat(look).startsWith("Start this inspection?")
        .contains("Structure: Aisle C racking run (racking run)")
        .contains("frame 1").contains("spine")
        .contains("Inspector: Ada Quill").contains("Position: Racking inspector, Quill Ltd")
        .contains("Competent person: Bo Lindqvist").contains("Shift: night")
        .contains("Storage safety: Sam Odell").contains("Reason: after impact")
        .contains("None of these can be changed once the inspection has started");
    assertThat(services.inspections().inspections(structure)).hasSize(before);
    assertThat(opened).isEmpty();
    assertThat(vm.statusProperty().get()).startsWith("Not started");
    dialogs.confirmAnswers.add(true);
    assertThat(vm.startInspection()).isTrue();
    assertThat(services.inspections().inspections(structure)).hasSize(before + 1);
  }

  @Test
  void theEmptyFieldsErrorFollowsTheFieldsAndGoesOnceTheyAreFilled() {
    services = DemoDatabase.withDemo(dir);
    SitesViewModel vm = sitesOf(services);
    vm.selectedProperty().set(row(vm, "north facade"));
    assertThat(vm.startInspection()).isFalse();
    assertThat(vm.errorProperty().get()).startsWith("Inspector, Position, Competent person, Shift: empty.");
    vm.inspectorNameProperty().set("Ada Quill");
    vm.inspectorPositionProperty().set("Scaffold inspector");
    assertThat(vm.errorProperty().get()).startsWith("Competent person, Shift: empty.");
    vm.competentPersonProperty().set("Ada Quill");
    vm.shiftProperty().set("day");
    assertThat(vm.errorProperty().get()).isEmpty();
    // another error is left alone by typing
    vm.selectedProperty().set(null);
    assertThat(vm.startInspection()).isFalse();
    vm.shiftProperty().set("night");
    assertThat(vm.errorProperty().get()).startsWith("Select the structure");
  }

  /** The plane named "spine" of structure 1 (the demo's racking run). */
  private static PlaneRecord spineOf(AppServices services) {
    return services.sites().planes(1).stream()
        .filter(p -> p.name().equals("spine"))
        .findFirst()
        .orElseThrow();
  }
}
