package org.bracewalk.ui.sites;

import static org.assertj.core.api.Assertions.assertThat;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import javafx.scene.Node;
import javafx.scene.Scene;
import javafx.scene.control.Label;
import javafx.scene.input.KeyCode;
import javafx.stage.Stage;
import org.bracewalk.app.AppServices;
import org.bracewalk.ui.DemoDatabase;
import org.bracewalk.ui.Stylesheet;
import org.bracewalk.ui.common.FakeDialogs;
import org.junit.jupiter.api.AfterEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.extension.ExtendWith;
import org.junit.jupiter.api.io.TempDir;
import org.testfx.api.FxRobot;
import org.testfx.framework.junit5.ApplicationExtension;
import org.testfx.framework.junit5.Start;
import org.testfx.util.WaitForAsyncUtils;

/**
 * The start form's Tab order is the natural one (who inspects, their position, the competent
 * person, the shift, the storage safety person, the reason), and the README's walk-round
 * paragraph names that same order, taken here from the form itself.
 */
@ExtendWith(ApplicationExtension.class)
class SitesFormOrderFxTest {
  @TempDir Path dir;
  private AppServices services;
  private SitesView view;

  @Start
  void start(Stage stage) {
    services = DemoDatabase.withDemo(dir);
    SitesViewModel vm = new SitesViewModel(services.sites(), services.inspections(), services.analysis(),
        services.demo(), services.store().location(), DemoDatabase.CLOCK, new FakeDialogs(), (s, sel) -> { },
        Runnable::run, Runnable::run);
    view = new SitesView(vm);
    Scene scene = new Scene(view, 1280, 800);
    Stylesheet.apply(scene);
    stage.setScene(scene);
    stage.show();
    view.focusTable();
  }

  @AfterEach
  void close() {
    services.close();
  }

  /** The label of the focused field, without its mnemonic mark, in lower case. */
  private String focusedFieldLabel(FxRobot robot) {
    Node focus = view.getScene().getFocusOwner();
    return robot.lookup(n -> n instanceof Label l && l.getLabelFor() == focus).tryQuery()
        .map(n -> ((Label) n).getText().replace("_", "").toLowerCase(Locale.ROOT))
        .orElse(focus == null ? "nothing" : focus.getClass().getSimpleName() + " " + focus.getId());
  }

  /** Enter on a structure goes to the first field; Tab walks the rest, in the order the README gives. */
  private List<String> tabOrder(FxRobot robot) {
    robot.type(KeyCode.ENTER); // on the first structure, which has no open inspection: to the first field
    WaitForAsyncUtils.waitForFxEvents();
    List<String> order = new ArrayList<>();
    order.add(focusedFieldLabel(robot));
    for (int i = 0; i < 5; i++) {
      robot.type(KeyCode.TAB);
      WaitForAsyncUtils.waitForFxEvents();
      order.add(focusedFieldLabel(robot));
    }
    return order;
  }

  @Test
  void tabGoesThroughTheFieldsInTheNaturalOrderAndTheReadmeSaysSo(FxRobot robot) throws Exception {
    List<String> order = tabOrder(robot);
    // common practice: who, in what capacity, for whom (the competent person), when, then why
    assertThat(order).containsExactly("inspector", "position", "competent person", "shift", "storage safety",
        "reason");
    String readme = Files.readString(Path.of("README.md")).replaceAll("\\s+", " ");
    assertThat(readme).contains("Tab goes " + String.join(" \u2192 ", order));
  }

  @Test
  void theEmptyDatabaseOfferDescribesTheDemoAsItIs(FxRobot robot) {
    // the demo as loaded: finished inspections per structure
    long racking = 0;
    long scaffold = 0;
    for (var site : services.sites().sites()) {
      for (var st : services.sites().structures(site.id())) {
        long done = services.inspections().inspections(st.id()).stream()
            .filter(org.bracewalk.core.model.Inspection::isFinalised).count();
        if (st.kind() == org.bracewalk.core.model.StructureKind.RACKING_RUN) {
          racking += done;
        } else {
          scaffold += done;
        }
      }
    }
    assertThat(racking).isEqualTo(2);
    assertThat(scaffold).isEqualTo(1);
    String offer = robot.lookup(n -> n instanceof Label l && l.getText().startsWith("Load the demo site to try"))
        .queryAs(Label.class).getText();
    assertThat(offer).contains("racking run has two finished inspections")
        .contains("scaffold has one finished routine inspection");
  }
}
