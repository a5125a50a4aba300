package org.bracewalk.app;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

import java.lang.reflect.InvocationHandler;
import java.lang.reflect.InvocationTargetException;
import java.lang.reflect.Proxy;
import java.nio.file.Files;
import java.nio.file.Path;
import java.sql.Connection;
import java.sql.ResultSet;
import java.sql.Statement;
import java.time.Instant;
import java.time.LocalDate;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import org.bracewalk.app.report.ReportService;
import org.bracewalk.app.report.Verification;
import org.bracewalk.core.analysis.PlaneAnalyzer;
import org.bracewalk.core.model.DesignRevision;
import org.bracewalk.core.model.Inspection;
import org.bracewalk.core.model.InspectionReason;
import org.bracewalk.core.model.PanelRef;
import org.bracewalk.core.model.PanelState;
import org.bracewalk.core.model.PlaneRecord;
import org.bracewalk.core.model.Structure;
import org.bracewalk.core.port.GlobalIdentities.Kind;
import org.bracewalk.core.port.ObservationRepository;
import org.bracewalk.core.port.RecordStore;
import org.bracewalk.report.PdfDocumentStampReader;
import org.bracewalk.report.PdfRepairOrderRenderer;
import org.bracewalk.report.PdfReportRenderer;
import org.bracewalk.report.TemplateSource;
import org.bracewalk.store.Database;
import org.bracewalk.store.StoreBackend;
import org.junit.jupiter.api.AfterEach;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * Field files that sync with a real team server (PostgreSQL: {@code BRACEWALK_TEST_PG}, as the
 * store's tests; without it the tests are skipped with the reason, and in CI they fail). Two
 * inspectors work offline on two field files against one server. The outside reference is the
 * server's own row counts, read with plain SQL.
 */
class SyncServiceTest {
  private static final String[] TABLES = {"sites", "structures", "planes", "design_revisions",
      "inspections", "observations", "photos", "repair_orders", "repair_actions",
      "issued_reports"};

  @TempDir Path dir;
  private final Fixtures.SteppingClock clock =
      new Fixtures.SteppingClock(Instant.parse("2025-03-20T08:00:00Z"));
  private final List<AppServices> opened = new ArrayList<>();
  private String serverLocation;
  private AppServices server;
  private AppServices fieldA;
  private AppServices fieldB;

  @BeforeEach
  void setUp() {
    serverLocation = StoreBackend.POSTGRESQL.freshLocation(dir);
    server = open(serverLocation);
    server.demo().load();
    fieldA = open(dir.resolve("a.db").toString());
    fieldB = open(dir.resolve("b.db").toString());
  }

  @AfterEach
  void tearDown() {
    opened.forEach(AppServices::close);
  }

  private AppServices open(String location) {
    AppServices s = AppServices.over(Database.open(location, StoreBackend.env()), clock,
        PlaneAnalyzer.standard());
    opened.add(s);
    return s;
  }

  private SyncService.Summary sync(AppServices field) {
    return new SyncService(clock).sync(field, server);
  }

  /** Every synced table's row count on the server, read with plain SQL. */
  private Map<String, Long> serverCounts() throws Exception {
    Map<String, Long> out = new LinkedHashMap<>();
    try (Connection c = StoreBackend.connect(serverLocation); Statement st = c.createStatement()) {
      for (String t : TABLES) {
        try (ResultSet r = st.executeQuery("SELECT count(*), count(DISTINCT uuid) FROM " + t)) {
          r.next();
          assertThat(r.getLong(2)).as("no uuid twice in " + t).isEqualTo(r.getLong(1));
          out.put(t, r.getLong(1));
        }
      }
    }
    return out;
  }

  private Structure structureNamed(AppServices s, String kindLabel) {
    return s.sites().sites().stream().flatMap(site -> s.sites().structures(site.id()).stream())
        .filter(st -> st.kind().label().equals(kindLabel)).findFirst().orElseThrow();
  }

  /** An inspection recorded offline: {@code marks} panels of the structure's first plane. */
  private Inspection inspectOffline(AppServices field, String kindLabel, String inspector,
      int marks, boolean photo) throws Exception {
    Structure st = structureNamed(field, kindLabel);
    PlaneRecord plane = field.sites().planes(st.id()).get(0);
    // every particular a report under any jurisdiction asks for
    Inspection i = field.inspections().start(st.id(), new NewInspection(inspector, "inspector",
        inspector, "day", "Sam Keeper", InspectionReason.ROUTINE, "", ""));
    int done = 0;
    for (int lift = 1; lift <= plane.grid().lifts() && done < marks; lift++) {
      for (int bay = 1; bay <= plane.grid().bays() && done < marks; bay++) {
        NewObservation o = NewObservation.of(plane.id(), PanelRef.of(lift, bay),
            done == 0 ? PanelState.MISSING : PanelState.SOUND, inspector);
        if (done == 0 && photo) {
          Path jpeg = dir.resolve(inspector.replace(' ', '_') + ".jpg");
          Files.write(jpeg, new byte[] {(byte) 0xFF, (byte) 0xD8, (byte) 0xFF, (byte) 0xE0, 1, 2});
          field.inspections().record(i.id(), o, List.of(jpeg));
        } else {
          field.inspections().recordObservation(i.id(), o);
        }
        done++;
      }
    }
    return field.inspections().finalise(i.id());
  }

  @Test
  void twoInspectorsOfflineOnDifferentAndOnTheSameStructureAndPushingTwiceDoublesNothing()
      throws Exception {
    SyncService.Summary firstA = sync(fieldA);
    sync(fieldB);
    assertThat(firstA.pulled()).containsKeys(Kind.SITE, Kind.STRUCTURE, Kind.PLANE,
        Kind.DESIGN_REVISION);
    assertThat(fieldA.store().identities().all(Kind.PLANE).values())
        .containsExactlyInAnyOrderElementsOf(
            server.store().identities().all(Kind.PLANE).values());
    Map<String, Long> before = serverCounts();

    // offline: A on the scaffold, B on the racking run (different structures), then both on the
    // scaffold (the same structure)
    inspectOffline(fieldA, "scaffold", "Ada Field", 4, true);
    inspectOffline(fieldB, "racking-run", "Ben Yard", 3, false);
    inspectOffline(fieldB, "scaffold", "Ben Yard", 2, true);

    SyncService.Summary a = sync(fieldA);
    SyncService.Summary b = sync(fieldB);
    assertThat(a.conflicts()).isEmpty();
    assertThat(b.conflicts()).isEmpty();
    assertThat(a.pushedInspections()).isEqualTo(1);
    assertThat(a.pushedObservations()).isEqualTo(4);
    assertThat(b.pushedInspections()).isEqualTo(2);
    assertThat(b.pushedObservations()).isEqualTo(5);
    Map<String, Long> after = serverCounts();
    assertThat(after.get("inspections")).isEqualTo(before.get("inspections") + 3);
    assertThat(after.get("observations")).isEqualTo(before.get("observations") + 9);
    assertThat(after.get("photos")).isEqualTo(before.get("photos") + 2);
    assertThat(after.get("sites")).isEqualTo(before.get("sites"));

    // push twice (and once more each): nothing doubles
    SyncService.Summary again = sync(fieldA);
    sync(fieldB);
    sync(fieldB);
    assertThat(again.pushedInspections()).isZero();
    assertThat(again.pulledCount()).isZero();
    assertThat(again.skippedInspections()).isEqualTo(1);
    assertThat(serverCounts()).isEqualTo(after);
  }

  /** A server store whose observation adds fail after {@code allowed}: the process dies there. */
  private static RecordStore dyingAfter(RecordStore inner, int allowed) {
    int[] added = {0};
    InvocationHandler observations = (proxy, m, args) -> {
      if (m.getName().equals("add") && ++added[0] > allowed) {
        throw new IllegalStateException("killed mid-sync (simulated)");
      }
      return call(m, inner.observations(), args);
    };
    ObservationRepository o = (ObservationRepository) Proxy.newProxyInstance(
        ObservationRepository.class.getClassLoader(), new Class<?>[] {ObservationRepository.class},
        observations);
    return (RecordStore) Proxy.newProxyInstance(RecordStore.class.getClassLoader(),
        new Class<?>[] {RecordStore.class},
        (proxy, m, args) -> m.getName().equals("observations") ? o : call(m, inner, args));
  }

  private static Object call(java.lang.reflect.Method m, Object target, Object[] args)
      throws Throwable {
    try {
      return m.invoke(target, args);
    } catch (InvocationTargetException e) {
      throw e.getCause();
    }
  }

  @Test
  void aSyncKilledMidWayLeavesWholeInspectionsAndTheNextOneFinishes() throws Exception {
    sync(fieldA);
    inspectOffline(fieldA, "scaffold", "Ada Field", 3, false);
    inspectOffline(fieldA, "racking-run", "Ada Field", 4, true);
    inspectOffline(fieldA, "scaffold", "Ada Field", 5, false);
    Map<String, Long> before = serverCounts();

    // dies on the 2nd observation of the second inspection (the 5th observation pushed)
    assertThatThrownBy(() -> new SyncService(clock).sync(fieldA.store(),
        dyingAfter(server.store(), 4))).hasMessageContaining("killed mid-sync");
    Map<String, Long> cut = serverCounts();
    assertThat(cut.get("inspections")).isEqualTo(before.get("inspections") + 1);
    assertThat(cut.get("observations")).isEqualTo(before.get("observations") + 3);
    assertThat(cut.get("photos")).isEqualTo(before.get("photos"));

    SyncService.Summary next = sync(fieldA);
    assertThat(next.pushedInspections()).isEqualTo(2);
    assertThat(next.skippedInspections()).isEqualTo(1);
    assertThat(next.conflicts()).isEmpty();
    Map<String, Long> done = serverCounts();
    assertThat(done.get("inspections")).isEqualTo(before.get("inspections") + 3);
    assertThat(done.get("observations")).isEqualTo(before.get("observations") + 12);
    assertThat(done.get("photos")).isEqualTo(before.get("photos") + 1);
  }

  @Test
  void aDesignRevisedInBothPlacesBecomesTwoRevisionsWithANote() throws Exception {
    sync(fieldA);
    Structure st = structureNamed(fieldA, "scaffold");
    PlaneRecord plane = fieldA.sites().planes(st.id()).get(0);
    DesignRevision current = fieldA.sites().currentDesign(plane.id());
    DesignRevision inField = fieldA.sites().addDesignRevision(plane.id(), "Field Engineer",
        LocalDate.of(2025, 3, 21), "revised on site", current.design());
    long serverPlane = server.store().identities().idOf(Kind.PLANE,
        fieldA.store().identities().uuidOf(Kind.PLANE, plane.id())).orElseThrow();
    DesignRevision inOffice = server.sites().addDesignRevision(serverPlane, "Office Engineer",
        LocalDate.of(2025, 3, 21), "revised in the office", current.design());
    assertThat(inField.number()).isEqualTo(inOffice.number());

    SyncService.Summary s = sync(fieldA);
    assertThat(s.conflicts()).hasSize(2).allSatisfy(c -> assertThat(c.message())
        .contains("revised in two places").contains("'" + plane.name() + "'"));
    List<DesignRevision> field = fieldA.store().designs().ofPlane(plane.id());
    List<DesignRevision> office = server.store().designs().ofPlane(serverPlane);
    assertThat(field).hasSize(office.size()).hasSize(current.number() + 2);
    assertThat(field).extracting(DesignRevision::approvalNote)
        .anySatisfy(n -> assertThat(n).startsWith("revised in the office — revised in two places"));
    assertThat(office).extracting(DesignRevision::approvalNote)
        .anySatisfy(n -> assertThat(n).startsWith("revised on site — revised in two places"));
    // the next sync finds nothing more to do
    SyncService.Summary again = sync(fieldA);
    assertThat(again.conflicts()).isEmpty();
    assertThat(again.pulledCount()).isZero();
    assertThat(server.store().designs().ofPlane(serverPlane)).hasSize(office.size());
  }

  @Test
  void aRevisionRecordedBeforeAFieldInspectionEndedIsStoredAsOfTheSyncWithANote()
      throws Exception {
    sync(fieldA);
    Structure st = structureNamed(fieldA, "scaffold");
    PlaneRecord plane = fieldA.sites().planes(st.id()).get(0);
    long serverPlane = server.store().identities().idOf(Kind.PLANE,
        fieldA.store().identities().uuidOf(Kind.PLANE, plane.id())).orElseThrow();
    DesignRevision current = server.sites().currentDesign(serverPlane);
    // the office revises the design; the field, not yet knowing, finishes an inspection after
    DesignRevision office = server.sites().addDesignRevision(serverPlane, "Office Engineer",
        LocalDate.of(2025, 3, 21), "", current.design());
    Inspection done = inspectOffline(fieldA, "scaffold", "Ada Field", 2, false);
    assertThat(done.finishedAt()).isAfter(office.recordedAt());

    SyncService.Summary s = sync(fieldA);
    assertThat(s.conflicts()).singleElement().satisfies(c -> assertThat(c.message())
        .contains("was recorded before an inspection finalised in the field file ended"));
    assertThat(s.pushedInspections()).isEqualTo(1);
    DesignRevision pulled = fieldA.store().designs().ofPlane(plane.id()).stream()
        .filter(d -> d.number() == office.number()).findFirst().orElseThrow();
    assertThat(pulled.recordedAt()).isAfter(done.finishedAt());
    assertThat(pulled.approvalNote()).contains("recorded in the server at " + office.recordedAt());
    assertThat(fieldA.store().identities().uuidOf(Kind.DESIGN_REVISION, pulled.id()))
        .isEqualTo(server.store().identities().uuidOf(Kind.DESIGN_REVISION, office.id()));
    // the field inspection was checked against the design in force when it started, as before
    assertThat(fieldA.inspections().designInForce(done.id(), plane.id()).number())
        .isEqualTo(current.number());
    assertThat(sync(fieldA).conflicts()).isEmpty();
  }

  @Test
  void anInspectionTheServerHoldsDifferentlyIsRefusedNamingBothIds() throws Exception {
    sync(fieldA);
    Inspection mine = inspectOffline(fieldA, "scaffold", "Ada Field", 2, false);
    String uuid = fieldA.store().identities().uuidOf(Kind.INSPECTION, mine.id());
    // the server holds another record under the same identity
    long serverStructure = server.store().identities().idOf(Kind.STRUCTURE,
        fieldA.store().identities().uuidOf(Kind.STRUCTURE, mine.structureId())).orElseThrow();
    Inspection theirs = server.store().identities().adopting(Kind.INSPECTION, uuid,
        () -> server.inspections().start(serverStructure,
            NewInspection.of("Somebody Else", "inspector", InspectionReason.ROUTINE)));
    Map<String, Long> before = serverCounts();

    SyncService.Summary s = sync(fieldA);
    assertThat(s.pushedInspections()).isZero();
    assertThat(s.conflicts()).singleElement().satisfies(c -> assertThat(c.message())
        .contains("inspection " + mine.id() + " of the field file")
        .contains("inspection " + theirs.id() + " of the server").contains(uuid)
        .contains("site '").contains("structure '").containsPattern("planes? '"));
    assertThat(serverCounts()).isEqualTo(before);
  }

  private ReportService reports(AppServices s) {
    return new ReportService(s, PlaneAnalyzer.standard(),
        new PdfReportRenderer(TemplateSource.packed(), "en"),
        new PdfRepairOrderRenderer(TemplateSource.packed(), "en"), new PdfDocumentStampReader(),
        clock);
  }

  @Test
  void aReportIssuedFromEitherCopyVerifiesAgainstTheOther() throws Exception {
    sync(fieldA);
    Inspection mine = inspectOffline(fieldA, "racking-run", "Ada Field", 3, true);
    Path fromField = dir.resolve("from-field.pdf");
    reports(fieldA).issueReport(reports(fieldA).reportContent(mine.id()), fromField);
    sync(fieldA);

    // the field's report against the server
    Verification onServer = reports(server).verify(Files.readAllBytes(fromField));
    assertThat(onServer.outcome()).as("%s", onServer.differences())
        .isEqualTo(Verification.Outcome.MATCH);

    // the reverse: issued from the server, verified against the field file after a sync
    long serverId = server.store().identities().idOf(Kind.INSPECTION,
        fieldA.store().identities().uuidOf(Kind.INSPECTION, mine.id())).orElseThrow();
    assertThat(serverId).isNotEqualTo(mine.id());
    Path fromServer = dir.resolve("from-server.pdf");
    reports(server).issueReport(reports(server).reportContent(serverId), fromServer);
    assertThat(reports(fieldA).verify(Files.readAllBytes(fromServer)).outcome())
        .as("not yet synced: the field file has no register row for it")
        .isEqualTo(Verification.Outcome.DIFFERS);
    sync(fieldA);
    Verification onField = reports(fieldA).verify(Files.readAllBytes(fromServer));
    assertThat(onField.outcome()).as("%s", onField.differences())
        .isEqualTo(Verification.Outcome.MATCH);
    assertThat(onField.notes()).anySatisfy(n -> assertThat(n)
        .contains("where the inspection is " + serverId).contains("it is " + mine.id()));
  }
}
