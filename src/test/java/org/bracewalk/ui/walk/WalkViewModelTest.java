package org.bracewalk.ui.walk;

import org.bracewalk.core.model.DefectType;
import static org.assertj.core.api.Assertions.assertThat;

import java.nio.file.Path;
import java.util.List;
import java.util.Map;
import org.bracewalk.core.analysis.PlaneAnalyzer;
import org.bracewalk.core.model.Brace;
import org.bracewalk.core.model.Diagonal;
import org.bracewalk.core.model.PanelRef;
import org.bracewalk.core.model.PanelState;
import org.bracewalk.core.model.PlaneDesign;
import org.bracewalk.core.model.PlaneGrid;
import org.bracewalk.core.model.Support;
import org.bracewalk.ui.common.FakeDialogs;
import org.bracewalk.app.verdict.VerdictKind;
import org.junit.jupiter.api.Test;

class WalkViewModelTest {
  // one rigid brace per lift on a pinned base: rigid, and every brace critical
  private final PlaneDesign design =
      PlaneDesign.of(
          PlaneGrid.uniform(3, 3, Support.PINNED_BASE),
          Map.of(
              PanelRef.of(1, 1), Brace.rigid(Diagonal.RISING),
              PanelRef.of(2, 2), Brace.rigid(Diagonal.FALLING),
              PanelRef.of(3, 3), Brace.rigid(Diagonal.RISING)));
  private final MemoryRecorder recorder = new MemoryRecorder();
  private final FakeDialogs dialogs = new FakeDialogs();

  private WalkViewModel walk(List<RecordedMark> existing, boolean readOnly) {
    return new WalkViewModel(
        design, "Test plane", existing, recorder, PlaneAnalyzer.standard(), dialogs, false, readOnly, java.time.Clock.systemUTC(),
        Runnable::run, Runnable::run);
  }

  private static void markAll(WalkViewModel vm, PanelState state, int times) {
    for (int k = 0; k < times; k++) {
      assertThat(vm.mark(state)).isTrue();
    }
  }

  @Test
  void aMarkIsCommittedAndTheCursorMovesOnInWalkOrder() {
    WalkViewModel vm = walk(List.of(), false);
    assertThat(vm.cursor()).isEqualTo(PanelRef.of(1, 1));
    vm.mark(PanelState.SOUND);
    assertThat(recorder.rows).hasSize(1);
    assertThat(recorder.rows.get(0).panel()).isEqualTo(PanelRef.of(1, 1));
    assertThat(recorder.rows.get(0).mark().state()).isEqualTo(PanelState.SOUND);
    assertThat(vm.cursor()).isEqualTo(PanelRef.of(2, 1));
    assertThat(vm.progressTextProperty().get()).isEqualTo("1 of 9 panels");
  }

  @Test
  void theCameraFolderGivesTheNextMarkThePhotosSavedSinceThePreviousMark(@org.junit.jupiter.api.io.TempDir Path dir)
      throws Exception {
    Path camera = java.nio.file.Files.createDirectories(dir.resolve("DCIM"));
    java.time.Instant now = java.time.Instant.now();
    Path old = photo(camera, "IMG_0001.jpg", now.minusSeconds(3600)); // before the walk-round opened
    photo(camera, "notes.txt", now.plusSeconds(5)); // not a photo
    WalkViewModel vm = walk(List.of(), false);
    CameraFolder.Setting setting = CameraFolder.Setting.inMemory();
    vm.useCameraFolderSetting(setting);
    Path first = photo(camera, "IMG_0002.JPG", now.plusSeconds(10));
    // the first time the folder is asked for, then remembered
    dialogs.folderAnswers.push(java.util.Optional.of(camera));
    vm.addCameraPhotos(false);
    assertThat(setting.get()).contains(camera);
    assertThat(vm.photos()).containsExactly(first.toAbsolutePath());
    vm.addCameraPhotos(false); // nothing new: nothing added twice
    assertThat(vm.photos()).containsExactly(first.toAbsolutePath());
    assertThat(vm.statusProperty().get()).contains("No new photos");
    assertThat(vm.mark(PanelState.DAMAGED_EFFECTIVE)).isTrue();
    assertThat(recorder.rows.get(0).mark().photos()).containsExactly(first.toAbsolutePath());
    assertThat(vm.photos()).isEmpty();
    // after the mark only what arrives later counts; the folder is not asked for again
    int asked = dialogs.asked.size();
    Path second = photo(camera, "IMG_0003.jpeg", java.time.Instant.now().plusSeconds(20));
    Path third = photo(camera, "IMG_0004.png", java.time.Instant.now().plusSeconds(30));
    vm.addCameraPhotos(false);
    assertThat(dialogs.asked).hasSize(asked);
    assertThat(vm.photos()).containsExactly(second.toAbsolutePath(), third.toAbsolutePath());
    assertThat(vm.photos()).doesNotContain(old.toAbsolutePath(), first.toAbsolutePath());
    // a folder that has gone: asked again; cancelled: nothing changes
    setting.set(dir.resolve("unplugged"));
    int before = dialogs.asked.size();
    vm.addCameraPhotos(false);
    assertThat(dialogs.asked).hasSize(before + 1);
    assertThat(dialogs.asked.get(before)).startsWith("Camera folder");
    assertThat(vm.photos()).hasSize(2);
    // Shift+F takes them off again; the files stay
    vm.clearPhotos();
    assertThat(vm.photos()).isEmpty();
    assertThat(second).exists();
  }

  @Test
  void afterAMarkTheCameraFolderIsComparedByItsFilesNotByTheirClocks(@org.junit.jupiter.api.io.TempDir Path dir)
      throws Exception {
    Path camera = java.nio.file.Files.createDirectories(dir.resolve("DCIM"));
    WalkViewModel vm = walk(List.of(), false);
    CameraFolder.Setting setting = CameraFolder.Setting.inMemory();
    setting.set(camera);
    vm.useCameraFolderSetting(setting);
    Path first = photo(camera, "IMG_0100.jpg", java.time.Instant.now().plusSeconds(1));
    vm.addCameraPhotos(false);
    assertThat(vm.photos()).containsExactly(first.toAbsolutePath());
    assertThat(vm.mark(PanelState.SOUND)).isTrue();
    // a phone whose clock is an hour behind; a hidden shadow file; a file still being copied (empty)
    Path late = photo(camera, "IMG_0101.jpg", java.time.Instant.now().minusSeconds(3600));
    photo(camera, "._IMG_0101.jpg", java.time.Instant.now());
    java.nio.file.Files.write(camera.resolve("IMG_0102.jpg"), new byte[0]);
    vm.addCameraPhotos(false);
    assertThat(vm.photos()).containsExactly(late.toAbsolutePath());
    assertThat(vm.statusProperty().get()).contains("Passed over: IMG_0102.jpg (empty");
    // taken off with Shift+F, G offers it again
    vm.clearPhotos();
    vm.addCameraPhotos(false);
    assertThat(vm.photos()).containsExactly(late.toAbsolutePath());
    // a photo that is gone by the time of the mark: checked where the mark is written, the mark
    // not recorded, the panel named; marked again, it is recorded without the photo
    java.nio.file.Files.delete(late);
    int rows = recorder.rows.size();
    PanelRef here = vm.cursor();
    assertThat(vm.mark(PanelState.SOUND)).isTrue();
    assertThat(vm.errorProperty().get()).contains("IMG_0101.jpg").contains("no longer there")
        .contains(here.toString()).contains("mark it again");
    assertThat(vm.photos()).isEmpty();
    assertThat(recorder.rows).hasSize(rows);
    assertThat(vm.findings()).doesNotContainKey(here);
    assertThat(vm.pictureProperty().get().findings()).doesNotContainKey(here);
    vm.select(here);
    assertThat(vm.mark(PanelState.SOUND)).isTrue();
    assertThat(recorder.rows).hasSize(rows + 1);
    assertThat(vm.errorProperty().get()).isEmpty();
  }

  @Test
  void choosingAnotherCameraFolderDoesNotBringItsOldPhotos(@org.junit.jupiter.api.io.TempDir Path dir)
      throws Exception {
    Path phone = java.nio.file.Files.createDirectories(dir.resolve("phone"));
    Path card = java.nio.file.Files.createDirectories(dir.resolve("card"));
    java.time.Instant monthAgo = java.time.Instant.now().minus(java.time.Duration.ofDays(30));
    for (int k = 0; k < 5; k++) {
      photo(card, "DSC_00" + k + ".JPG", monthAgo); // last month's pictures on the card
    }
    WalkViewModel vm = walk(List.of(), false);
    CameraFolder.Setting setting = CameraFolder.Setting.inMemory();
    setting.set(phone);
    vm.useCameraFolderSetting(setting);
    assertThat(vm.mark(PanelState.SOUND)).isTrue();
    dialogs.folderAnswers.push(java.util.Optional.of(card));
    vm.addCameraPhotos(true); // Shift+G
    assertThat(setting.get()).contains(card);
    assertThat(vm.photos()).isEmpty();
    Path today = photo(card, "DSC_0100.JPG", java.time.Instant.now().plusSeconds(1));
    vm.addCameraPhotos(false);
    assertThat(vm.photos()).containsExactly(today.toAbsolutePath());
  }

  private static Path photo(Path folder, String name, java.time.Instant written) throws java.io.IOException {
    Path f = java.nio.file.Files.write(folder.resolve(name), new byte[] {(byte) 0xFF, (byte) 0xD8, (byte) 0xFF, (byte) 0xE0, 1, 2}); // JPEG's first bytes
    java.nio.file.Files.setLastModifiedTime(f, java.nio.file.attribute.FileTime.from(written));
    return f;
  }

  @Test
  void theMarkThatCompletesThePlaneSaysEveryPanelIsMarked() {
    WalkViewModel vm = walk(List.of(), false);
    markAll(vm, PanelState.SOUND, 8);
    assertThat(vm.statusProperty().get()).doesNotContain("Every panel is marked");
    markAll(vm, PanelState.SOUND, 1); // the ninth and last in walk order
    assertThat(vm.statusProperty().get()).endsWith(". Every panel is marked: see Findings (Ctrl+4).");
  }

  @Test
  void whilePanelsRemainUnseenTheVerdictSaysItDependsOnThem() {
    WalkViewModel vm = walk(List.of(), false);
    assertThat(vm.verdict().kind()).isEqualTo(VerdictKind.DEPENDS_ON_UNSEEN);
    markAll(vm, PanelState.SOUND, 9);
    assertThat(vm.verdict().kind()).isEqualTo(VerdictKind.HOLDS);
    assertThat(vm.verdict().detail()).contains("critical");
    assertThat(vm.alarmProperty().get()).isEmpty();
  }

  @Test
  void markingACriticalBraceMissingAnnouncesLostRigidityNamingWhereToKeepPeopleOff() {
    WalkViewModel vm = walk(List.of(), false);
    vm.select(PanelRef.of(2, 2));
    vm.mark(PanelState.MISSING);
    assertThat(vm.verdict().kind()).isEqualTo(VerdictKind.LOST);
    // lift 1 not yet seen: the zone is the worst case (unseen panels counted as missing), as in
    // check and analyse of the same marks: every lift from lift 1 up
    assertThat(vm.alarmProperty().get())
        .contains("Keep people and loads off lifts 1-3, bays 1-3 until a competent person has acted.");
    vm.select(PanelRef.of(1, 1));
    markAll(vm, PanelState.SOUND, 1);
    vm.select(PanelRef.of(3, 3));
    markAll(vm, PanelState.SOUND, 1);
    // lift 2 shears; lift 3 above it is carried sideways: keep off lifts 2-3, every bay
    assertThat(vm.alarmProperty().get())
        .contains("Keep people and loads off lifts 2, 3, bays 1-3")
        .contains("competent person")
        .contains("Competent person to act: fit the")
        .endsWith("or take this part out of service.");
    assertThat(vm.pictureProperty().get().sway().shearing())
        .containsExactly(PanelRef.of(2, 1), PanelRef.of(2, 2), PanelRef.of(2, 3));
  }

  @Test
  void undoRecordsACorrectionAndNeverDeletes() {
    WalkViewModel vm = walk(List.of(), false);
    vm.select(PanelRef.of(2, 2));
    vm.mark(PanelState.MISSING);
    assertThat(vm.undo()).isTrue();
    assertThat(recorder.rows).hasSize(2);
    MemoryRecorder.Row correction = recorder.rows.get(1);
    assertThat(correction.supersedes()).isEqualTo(1L);
    assertThat(correction.mark().state()).isEqualTo(PanelState.NOT_INSPECTED);
    assertThat(correction.reason()).isEqualTo(WalkViewModel.UNDO_REASON);
    assertThat(vm.cursor()).isEqualTo(PanelRef.of(2, 2));
    assertThat(vm.verdict().kind()).isNotEqualTo(VerdictKind.LOST);
    assertThat(vm.alarmProperty().get()).isEmpty();
    assertThat(vm.progressTextProperty().get()).isEqualTo("0 of 9 panels");
  }

  @Test
  void undoAfterARemarkRestoresTheEarlierMark() {
    WalkViewModel vm = walk(List.of(), false);
    vm.mark(PanelState.SOUND);
    vm.select(PanelRef.of(1, 1));
    vm.mark(PanelState.MISSING);
    assertThat(recorder.rows.get(1).supersedes()).isEqualTo(1L);
    assertThat(recorder.rows.get(1).reason()).isEqualTo(WalkViewModel.REMARK_REASON);
    vm.undo();
    assertThat(recorder.rows.get(2).mark().state()).isEqualTo(PanelState.SOUND);
    assertThat(recorder.rows.get(2).supersedes()).isEqualTo(2L);
  }

  @Test
  void aBadBowMeasurementRecordsNothingAndNamesTheField() {
    WalkViewModel vm = walk(List.of(), false);
    vm.bowMmProperty().set("12a");
    assertThat(vm.mark(PanelState.DAMAGED_EFFECTIVE)).isFalse();
    assertThat(recorder.rows).isEmpty();
    assertThat(vm.errorProperty().get()).startsWith("Bow: '12a' is not a number");
    assertThat(vm.cursor()).isEqualTo(PanelRef.of(1, 1));
    vm.bowMmProperty().set("8");
    vm.defectProperty().set(DefectType.BENT);
    vm.noteProperty().set("near the base plate");
    assertThat(vm.mark(PanelState.DAMAGED_EFFECTIVE)).isTrue();
    Mark m = recorder.rows.get(0).mark();
    assertThat(m.bowMm()).isEqualTo(8.0);
    assertThat(m.gaugeLengthMm()).isEqualTo(1000);
    assertThat(m.defect()).isEqualTo(DefectType.BENT);
    assertThat(m.note()).isEqualTo("near the base plate");
    assertThat(vm.bowMmProperty().get()).isEmpty();
  }

  @Test
  void aFailedCommitTakesThePanelBackAndSaysSoWithoutStoppingTheWalk() {
    WalkViewModel vm = walk(List.of(), false);
    recorder.failNext = true;
    assertThat(vm.mark(PanelState.MISSING)).isTrue();
    assertThat(vm.findings()).isEmpty();
    assertThat(vm.pictureProperty().get().findings()).isEmpty();
    assertThat(vm.errorProperty().get()).contains("Not recorded").contains("lift 1, bay 1").contains("missing")
        .contains("disk full");
    assertThat(dialogs.errors).as("no window stops the walk").isEmpty();
    assertThat(vm.canUndoProperty().get()).as("nothing stored to undo").isFalse();
    // the next panel is recorded; the error stays until lift 1, bay 1 is marked again and stored
    assertThat(vm.mark(PanelState.SOUND)).isTrue();
    assertThat(recorder.rows).singleElement().extracting(MemoryRecorder.Row::panel).isNotEqualTo(PanelRef.of(1, 1));
    assertThat(vm.errorProperty().get()).contains("lift 1, bay 1");
    vm.select(PanelRef.of(1, 1));
    vm.mark(PanelState.MISSING);
    assertThat(vm.errorProperty().get()).isEmpty();
    assertThat(recorder.rows).hasSize(2);
  }

  @Test
  void theScreenShowsAMarkAtOnceAndTheVerdictFollowsTheRecord() {
    HeldTasks queue = new HeldTasks();
    WalkViewModel vm = new WalkViewModel(design, "Test plane", List.of(), recorder, PlaneAnalyzer.standard(), dialogs,
        false, false, java.time.Clock.systemUTC(), Runnable::run, queue);
    queue.runAll();
    vm.select(PanelRef.of(2, 2));
    assertThat(vm.mark(PanelState.MISSING)).isTrue();
    // shown at once: the picture and the cursor; nothing written yet, the verdict unchanged
    assertThat(vm.pictureProperty().get().findings()).containsKey(PanelRef.of(2, 2));
    assertThat(vm.cursor()).isNotEqualTo(PanelRef.of(2, 2));
    assertThat(recorder.rows).isEmpty();
    assertThat(vm.writing()).isTrue();
    assertThat(vm.verdict().kind()).isEqualTo(VerdictKind.DEPENDS_ON_UNSEEN);
    assertThat(vm.alarmProperty().get()).isEmpty();
    queue.runAll();
    assertThat(recorder.rows).hasSize(1);
    assertThat(vm.writing()).isFalse();
    assertThat(vm.verdict().kind()).isEqualTo(VerdictKind.LOST);
    assertThat(vm.statusProperty().get()).contains("Saved lift 2, bay 2").contains("(record 1)");
  }

  @Test
  void marksAndUndosQueuedFasterThanTheyAreWrittenReachTheRecordInKeyOrderEachCorrectingTheOneBefore() {
    HeldTasks queue = new HeldTasks();
    WalkViewModel vm = new WalkViewModel(design, "Test plane", List.of(), recorder, PlaneAnalyzer.standard(), dialogs,
        false, false, java.time.Clock.systemUTC(), Runnable::run, queue);
    vm.select(PanelRef.of(1, 1));
    vm.mark(PanelState.SOUND); // record 1
    vm.select(PanelRef.of(1, 1));
    vm.mark(PanelState.MISSING); // record 2 corrects 1
    vm.undo(); // record 3 corrects 2, back to sound
    vm.undo(); // record 4 corrects 3, back to not inspected
    vm.mark(PanelState.DAMAGED_EFFECTIVE); // record 5 corrects 4
    assertThat(recorder.rows).isEmpty();
    queue.runAll();
    assertThat(recorder.rows).extracting(MemoryRecorder.Row::supersedes).containsExactly(null, 1L, 2L, 3L, 4L);
    assertThat(recorder.rows).extracting(r -> r.mark().state()).containsExactly(PanelState.SOUND,
        PanelState.MISSING, PanelState.SOUND, PanelState.NOT_INSPECTED, PanelState.DAMAGED_EFFECTIVE);
    assertThat(recorder.rows).extracting(MemoryRecorder.Row::reason).containsExactly(null,
        WalkViewModel.REMARK_REASON, WalkViewModel.UNDO_REASON, WalkViewModel.UNDO_REASON, WalkViewModel.REMARK_REASON);
    assertThat(vm.findings()).containsEntry(PanelRef.of(1, 1),
        org.bracewalk.core.model.PanelFinding.of(PanelState.DAMAGED_EFFECTIVE));
  }

  @Test
  void anUndoQueuedBehindAMarkThatFailsWritesNothing() {
    HeldTasks queue = new HeldTasks();
    WalkViewModel vm = new WalkViewModel(design, "Test plane", List.of(), recorder, PlaneAnalyzer.standard(), dialogs,
        false, false, java.time.Clock.systemUTC(), Runnable::run, queue);
    vm.mark(PanelState.SOUND);
    vm.undo();
    recorder.failNext = true;
    queue.runAll();
    assertThat(recorder.rows).isEmpty();
    assertThat(vm.findings()).isEmpty();
    assertThat(vm.pictureProperty().get().findings()).isEmpty();
    assertThat(vm.errorProperty().get()).contains("lift 1, bay 1").contains("disk full");
  }

  @Test
  void aFailedUndoLeavesTheMarkInPlaceAndUndoableAgain() {
    WalkViewModel vm = walk(List.of(), false);
    vm.select(PanelRef.of(2, 2));
    vm.mark(PanelState.MISSING);
    recorder.failNext = true;
    assertThat(vm.undo()).isTrue();
    assertThat(vm.verdict().kind()).isEqualTo(VerdictKind.LOST);
    assertThat(vm.pictureProperty().get().findings()).containsKey(PanelRef.of(2, 2));
    assertThat(vm.errorProperty().get()).contains("undo").contains("lift 2, bay 2").contains("disk full");
    assertThat(vm.canUndoProperty().get()).isTrue();
    assertThat(vm.undo()).isTrue();
    assertThat(recorder.rows).hasSize(2);
    assertThat(recorder.rows.get(1).supersedes()).isEqualTo(1L);
    assertThat(vm.verdict().kind()).isNotEqualTo(VerdictKind.LOST);
  }

  @Test
  void thePhotoFilesAreCheckedWhereTheMarkIsWrittenNotAtTheKeyPress(@org.junit.jupiter.api.io.TempDir Path dir)
      throws Exception {
    HeldTasks queue = new HeldTasks();
    WalkViewModel vm = new WalkViewModel(design, "Test plane", List.of(), recorder, PlaneAnalyzer.standard(), dialogs,
        false, false, java.time.Clock.systemUTC(), Runnable::run, queue);
    Path gone = dir.resolve("gone.jpg"); // never there: a check at the key press would refuse the mark
    dialogs.photoAnswers.push(List.of(gone));
    vm.addPhotos();
    assertThat(vm.mark(PanelState.DAMAGED_EFFECTIVE)).isTrue();
    assertThat(vm.errorProperty().get()).isEmpty();
    queue.runAll();
    assertThat(recorder.rows).isEmpty();
    assertThat(vm.errorProperty().get()).contains("lift 1, bay 1").contains("gone.jpg").contains("no longer there");
  }

  @Test
  void theCameraFolderIsReadOnTheWriteQueueNotOnTheCallersTurn(@org.junit.jupiter.api.io.TempDir Path dir)
      throws Exception {
    Path camera = java.nio.file.Files.createDirectories(dir.resolve("DCIM"));
    HeldTasks queue = new HeldTasks();
    WalkViewModel vm = new WalkViewModel(design, "Test plane", List.of(), recorder, PlaneAnalyzer.standard(), dialogs,
        false, false, java.time.Clock.systemUTC(), Runnable::run, queue);
    CameraFolder.Setting setting = CameraFolder.Setting.inMemory();
    setting.set(camera);
    vm.useCameraFolderSetting(setting);
    queue.runAll();
    Path taken = photo(camera, "IMG_0200.jpg", java.time.Instant.now().plusSeconds(1));
    vm.addCameraPhotos(false);
    assertThat(vm.photos()).as("nothing read yet").isEmpty();
    queue.runAll();
    assertThat(vm.photos()).containsExactly(taken.toAbsolutePath());
  }

  @Test
  void aFinalisedInspectionRefusesMarks() {
    WalkViewModel vm = walk(List.of(), true);
    assertThat(vm.mark(PanelState.SOUND)).isFalse();
    assertThat(recorder.rows).isEmpty();
    assertThat(vm.errorProperty().get()).contains("read-only");
  }

  @Test
  void anExtraMemberIsRecordedOnlyWhereTheDesignHasNone() {
    WalkViewModel vm = walk(List.of(), false);
    assertThat(vm.mark(PanelState.EXTRA)).isFalse(); // 1,1 has a design brace
    assertThat(vm.errorProperty().get()).contains("lift 1, bay 1");
    vm.select(PanelRef.of(1, 2));
    vm.memberSeenProperty().set(Diagonal.FALLING);
    assertThat(vm.mark(PanelState.EXTRA)).isTrue();
    assertThat(recorder.rows.get(0).mark().memberFound()).isEqualTo(Brace.rigid(Diagonal.FALLING));
    assertThat(vm.memberSeenProperty().get()).isNull();
  }

  @Test
  void anExtraBraceCanStandInForAMissingOne() {
    WalkViewModel vm = walk(List.of(), false);
    markAll(vm, PanelState.SOUND, 4); // up bay 1, then 3,2
    vm.select(PanelRef.of(2, 2));
    vm.mark(PanelState.MISSING);
    assertThat(vm.verdict().kind()).isEqualTo(VerdictKind.LOST);
    vm.select(PanelRef.of(2, 1));
    vm.mark(PanelState.EXTRA);
    assertThat(vm.verdict().kind()).isNotEqualTo(VerdictKind.LOST);
  }

  @Test
  void photosChosenAreAttachedToTheNextMark(@org.junit.jupiter.api.io.TempDir Path dir) throws Exception {
    WalkViewModel vm = walk(List.of(), false);
    java.time.Instant now = java.time.Instant.now();
    dialogs.photoAnswers.push(List.of(photo(dir, "img1.jpg", now), photo(dir, "img2.jpg", now)));
    vm.addPhotos();
    assertThat(vm.photos()).hasSize(2);
    vm.mark(PanelState.DAMAGED_EFFECTIVE);
    assertThat(recorder.rows.get(0).mark().photos()).hasSize(2);
    assertThat(vm.photos()).isEmpty();
  }

  @Test
  void resumingStartsAtTheFirstUnmarkedPanelAndCountsEarlierMarks() {
    List<RecordedMark> existing =
        List.of(
            new RecordedMark(7, PanelRef.of(1, 1), Mark.of(PanelState.SOUND)),
            new RecordedMark(8, PanelRef.of(2, 1), Mark.of(PanelState.SOUND)));
    WalkViewModel vm = walk(existing, false);
    assertThat(vm.cursor()).isEqualTo(PanelRef.of(3, 1));
    assertThat(vm.doneProperty().get()).isEqualTo(2);
    vm.select(PanelRef.of(1, 1));
    vm.mark(PanelState.MISSING);
    assertThat(recorder.rows.get(0).supersedes()).isEqualTo(7L);
  }

  @Test
  void theMembersKeptPanelByPanelAreThoseTheModelDerivesFromTheFindings() {
    // seeded random walks: the view model's incremental members must equal AsBuiltPlane's
    java.util.Random rnd = new java.util.Random(20261201L);
    PanelState[] states = {
      PanelState.SOUND, PanelState.DAMAGED_EFFECTIVE, PanelState.DAMAGED_INEFFECTIVE,
      PanelState.MISSING, PanelState.EXTRA, PanelState.NOT_REACHABLE
    };
    for (int round = 0; round < 20; round++) {
      WalkViewModel vm = walk(List.of(), false);
      for (int k = 0; k < 15; k++) {
        vm.select(PanelRef.of(1 + rnd.nextInt(3), 1 + rnd.nextInt(3)));
        PanelState st = states[rnd.nextInt(states.length)];
        if (rnd.nextInt(4) == 0 || st == PanelState.EXTRA) {
          vm.memberSeenProperty().set(Diagonal.values()[rnd.nextInt(3)]);
        }
        vm.mark(st);
        if (rnd.nextInt(5) == 0) {
          vm.undo();
        }
        vm.memberSeenProperty().set(null);
        assertThat(vm.conservativeMembers())
            .isEqualTo(org.bracewalk.core.model.AsBuiltPlane.fromFindings(design, vm.findings()).members());
      }
    }
  }

  @Test
  void theCursorStopsAtTheEdges() {
    WalkViewModel vm = walk(List.of(), false);
    vm.move(-1, -1);
    assertThat(vm.cursor()).isEqualTo(PanelRef.of(1, 1));
    vm.move(5, 5);
    assertThat(vm.cursor()).isEqualTo(PanelRef.of(3, 3));
  }

  @Test
  void aBracedWalkEndsWithOneConfirmedStepThatRecordsTheRestAsDesigned() {
    WalkViewModel vm = walk(List.of(), false);
    vm.startWith(WalkOrder.BRACED_BAYS_UP_AND_DOWN);
    assertThat(vm.sequence()).containsExactly(PanelRef.of(1, 1), PanelRef.of(2, 2), PanelRef.of(3, 3));
    assertThat(vm.cursor()).isEqualTo(PanelRef.of(1, 1));
    markAll(vm, PanelState.SOUND, 3);
    assertThat(vm.statusProperty().get()).contains("End of the braced panels: A records the 6 panels not yet looked at");
    // declined: nothing recorded
    dialogs.confirmAnswers.push(false);
    assertThat(vm.recordRestAsDesigned()).isFalse();
    assertThat(dialogs.asked).singleElement().asString()
        .contains("Record the 6 panels not yet looked at as found as designed?");
    assertThat(recorder.rows).hasSize(3);
    // the record refuses: the panels go back to what it holds, and the error says so
    recorder.failNext = true;
    dialogs.confirmAnswers.push(true);
    assertThat(vm.recordRestAsDesigned()).isTrue();
    assertThat(recorder.rows).hasSize(3);
    assertThat(vm.errorProperty().get()).contains("Not recorded: the 6 panels as found as designed (disk full)");
    assertThat(vm.progressTextProperty().get()).isEqualTo("3 of 9 panels");
    // confirmed: one record per panel not yet looked at, sound as designed; then every panel counts
    dialogs.confirmAnswers.push(true);
    assertThat(vm.recordRestAsDesigned()).isTrue();
    assertThat(recorder.rows).hasSize(9);
    assertThat(recorder.rows.subList(3, 9)).allSatisfy(r -> {
      assertThat(r.mark().state()).isEqualTo(PanelState.SOUND);
      assertThat(r.mark().memberFound()).isNull();
      assertThat(r.supersedes()).isNull();
    });
    assertThat(recorder.rows.subList(3, 9)).extracting(MemoryRecorder.Row::panel)
        .doesNotContain(PanelRef.of(1, 1), PanelRef.of(2, 2), PanelRef.of(3, 3)).doesNotHaveDuplicates();
    assertThat(vm.errorProperty().get()).isEmpty();
    assertThat(vm.progressTextProperty().get()).isEqualTo("9 of 9 panels");
    assertThat(vm.verdict().kind()).isEqualTo(VerdictKind.HOLDS);
    // a panel found otherwise afterwards is marked again: a correction of the record just made
    vm.select(PanelRef.of(1, 2));
    long made = recorder.rows.stream().filter(r -> r.panel().equals(PanelRef.of(1, 2))).findFirst().orElseThrow().id();
    vm.memberSeenProperty().set(Diagonal.RISING);
    assertThat(vm.mark(PanelState.EXTRA)).isTrue();
    assertThat(recorder.rows.get(9).supersedes()).isEqualTo(made);
    assertThat(vm.recordRestAsDesigned()).as("nothing left to record").isFalse();
  }

  @Test
  void readOnlyRecordsNothingAsDesigned() {
    WalkViewModel vm = walk(List.of(), true);
    assertThat(vm.recordRestAsDesigned()).isFalse();
    assertThat(dialogs.asked).isEmpty();
    assertThat(vm.errorProperty().get()).contains("read-only");
  }
}
