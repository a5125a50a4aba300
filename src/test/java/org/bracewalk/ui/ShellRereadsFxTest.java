package org.bracewalk.ui;

import static org.assertj.core.api.Assertions.assertThat;

import java.util.Optional;
import java.util.concurrent.TimeUnit;
import javafx.scene.control.ChoiceBox;
import javafx.scene.control.Label;
import javafx.scene.input.KeyCode;
import org.bracewalk.core.model.PlaneRecord;
import org.bracewalk.ui.common.ScreenId;
import org.junit.jupiter.api.AfterAll;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.MethodOrderer;
import org.junit.jupiter.api.Order;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.TestInstance;
import org.junit.jupiter.api.TestMethodOrder;
import org.testfx.api.FxRobot;
import org.testfx.util.WaitForAsyncUtils;

/**
 * Through the main window: the header and every screen follow a change they did not make
 * themselves (an inspection finalised, a design saved as a new plane), and a screen with unsaved
 * changes is left only when the person says so. One window for the class (it takes seconds to
 * open): the design tests come first, finalising the inspection last.
 */
@TestInstance(TestInstance.Lifecycle.PER_CLASS)
@TestMethodOrder(MethodOrderer.OrderAnnotation.class)
class ShellRereadsFxTest {
  private AppWindowFixture app;
  private final FxRobot robot = new FxRobot();

  @BeforeAll
  void start() throws Exception {
    app = new AppWindowFixture();
  }

  @AfterAll
  void close() throws Exception {
    app.close();
  }

  private String crumbs() {
    return robot.lookup("#crumbs").queryAs(Label.class).getText();
  }

  private void keys(KeyCode modifier, KeyCode key) throws Exception {
    robot.press(modifier).type(key).release(modifier);
    app.settle();
  }

  @Test
  @Order(3)
  void afterFinalisingTheHeaderThePlanePickerAndTheDocumentsHintSayFinalised() throws Exception {
    app.open(ScreenId.FINDINGS, app.facadeInTheOpenInspection());
    assertThat(crumbs()).endsWith("inspection " + app.open.id() + " (open)");
    app.dialogs.confirmAnswers.push(true); // finalise: yes
    keys(KeyCode.CONTROL, KeyCode.F);
    app.settle();
    assertThat(app.services.inspections().inspection(app.open.id()).isFinalised()).isTrue();
    assertThat(crumbs()).endsWith("inspection " + app.open.id() + " (finalised)");
    ChoiceBox<?> picker = robot.lookup("#findings-planes").queryAs(ChoiceBox.class);
    assertThat(picker.getValue()).as("the plane picker").isNotNull();
    assertThat(picker.getValue().toString()).contains(app.facade.name());
    assertThat(robot.lookup("#findings-draft-hint").query().isVisible()).as("the DRAFT hint").isFalse();

    // the walk-round opened now says so too
    app.open(ScreenId.WALK, app.facadeInTheOpenInspection());
    assertThat(robot.lookup("#walk-inspection").queryAs(Label.class).getText()).endsWith("finalised (read-only)");
    assertThat(robot.lookup("#plane-choice").queryAs(ChoiceBox.class).getValue()).as("the walk's plane picker")
        .isNotNull();
    assertThat(crumbs()).endsWith("(finalised)");
  }

  @Test
  @Order(1)
  void theDesignEditorWithUnsavedChangesIsLeftOnlyWhenThePersonSaysSo() throws Exception {
    app.open(ScreenId.DESIGN, app.facadeInTheOpenInspection());
    robot.type(KeyCode.PERIOD); // the first panel's brace taken out: unsaved
    app.settle();
    app.open(ScreenId.OVERVIEW, app.facadeInTheOpenInspection()); // no answer: the default, stay
    assertThat(app.window.currentScreen()).isEqualTo(ScreenId.DESIGN);
    assertThat(app.dialogs.asked).last().asString().startsWith("The design has unsaved changes");
    assertThat(robot.lookup("#rail-design").queryAs(javafx.scene.control.ToggleButton.class).isSelected()).isTrue();
    app.dialogs.confirmAnswers.push(true);
    app.open(ScreenId.OVERVIEW, app.facadeInTheOpenInspection());
    assertThat(app.window.currentScreen()).isEqualTo(ScreenId.OVERVIEW);
  }

  @Test
  @Order(2)
  void afterASaveAsANewPlaneTheHeaderAndTheSelectionNameTheNewPlane() throws Exception {
    app.open(ScreenId.DESIGN, app.facadeInTheOpenInspection());
    assertThat(crumbs()).contains("north facade (revision 1)");
    keys(KeyCode.ALT, KeyCode.A); // the bays field
    keys(KeyCode.CONTROL, KeyCode.A);
    robot.write("11");
    robot.type(KeyCode.ENTER); // applies the grid, back to the plane
    app.settle();
    robot.type(KeyCode.A); // every panel braced: it holds its shape
    app.dialogs.textAnswers.add(Optional.of("north facade extended"));
    keys(KeyCode.CONTROL, KeyCode.S);
    app.settle();
    PlaneRecord made = app.services.sites().planes(app.facade.structureId()).stream()
        .filter(p -> p.name().equals("north facade extended")).findFirst().orElseThrow();
    assertThat(made.grid().bays()).isEqualTo(11);
    assertThat(crumbs()).contains("north facade extended (revision 1)").doesNotContain("north facade (revision");
    assertThat(robot.lookup("#design-title").queryAs(Label.class).getText())
        .isEqualTo("Design: north facade extended (revision 1)");
    assertThat(WaitForAsyncUtils.asyncFx(() -> app.window.selection().planeId()).get(60, TimeUnit.SECONDS))
        .isEqualTo(made.id());
    // saved: leaving asks nothing
    int asked = app.dialogs.asked.size();
    app.open(ScreenId.OVERVIEW, app.window.selection());
    assertThat(app.window.currentScreen()).isEqualTo(ScreenId.OVERVIEW);
    assertThat(app.dialogs.asked).hasSize(asked);
  }
}
