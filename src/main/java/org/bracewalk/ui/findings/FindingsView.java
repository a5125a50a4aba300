package org.bracewalk.ui.findings;

import java.util.List;
import java.util.function.LongConsumer;
import javafx.collections.ObservableList;
import javafx.geometry.Insets;
import javafx.scene.control.Button;
import javafx.scene.control.ChoiceBox;
import javafx.scene.control.Label;
import javafx.scene.control.ProgressBar;
import javafx.scene.control.ScrollPane;
import javafx.scene.input.KeyCode;
import javafx.scene.input.KeyEvent;
import javafx.scene.layout.BorderPane;
import javafx.scene.layout.Priority;
import javafx.scene.layout.VBox;
import org.bracewalk.ui.common.KeyHelp;
import org.bracewalk.ui.common.Legend;
import org.bracewalk.ui.common.PlaneCanvas;
import org.bracewalk.ui.common.Widgets;

/** The findings and repair screen. Only binds to its view model. */
public final class FindingsView extends BorderPane {
  private final FindingsViewModel vm;
  private final PlaneCanvas canvas = new PlaneCanvas();

  public FindingsView(FindingsViewModel vm, LongConsumer openPlane) {
    this.vm = vm;
    getStyleClass().add("screen");
    setId("findings-screen");
    Label title = Widgets.text(vm.titleProperty(), "screen-title");
    title.setMaxWidth(Label.USE_PREF_SIZE);
    ChoiceBox<FindingsViewModel.PlaneChoice> planes = new org.bracewalk.ui.common.WrappingChoiceBox<>(vm.planes());
    Runnable current = () -> {
      for (FindingsViewModel.PlaneChoice c : vm.planes()) {
        if (c.planeId() == vm.planeId()) {
          planes.setValue(c);
        }
      }
    };
    current.run();
    // the planes arrive once read on the background executor
    vm.planes().addListener((javafx.collections.ListChangeListener<FindingsViewModel.PlaneChoice>) c -> current.run());
    planes.setOnAction(e -> {
      if (planes.getValue() != null && planes.getValue().planeId() != vm.planeId()) {
        openPlane.accept(planes.getValue().planeId());
      }
    });
    planes.setId("findings-planes");
    Label planeLabel = new Label("Plane (P):");
    planeLabel.setMinWidth(Label.USE_PREF_SIZE);
    planes.setMaxWidth(Double.MAX_VALUE);
    javafx.scene.layout.HBox.setHgrow(planes, javafx.scene.layout.Priority.ALWAYS);
    javafx.scene.layout.HBox chooser = Widgets.row(12, planeLabel, planes);
    chooser.setAlignment(javafx.geometry.Pos.CENTER_RIGHT);
    // the title and the plane side by side where both fit, else the plane below the title
    setTop(new org.bracewalk.ui.common.LineOrStack(12, title, chooser));
    BorderPane.setMargin(getTop(), new Insets(0, 0, 8, 0));

    canvas.setId("findings-canvas");
    canvas.pictureProperty().bind(vm.pictureProperty());
    VBox.setVgrow(canvas, Priority.ALWAYS);
    Label summary = Widgets.text(vm.summaryProperty());
    // the legend scrolls in a strip of its own, so the drawing keeps the room it needs to show
    // frame members, joints and repair numbers at a size a person can read
    setCenter(new VBox(8, canvas, summary, legendStrip(new Legend(Legend.Set_.FINDINGS))));

    ScrollPane side = new ScrollPane(side());
    side.setFitToWidth(true);
    side.setPrefViewportWidth(420);
    side.setHbarPolicy(ScrollPane.ScrollBarPolicy.NEVER);
    setRight(side);

    Label error = Widgets.text(vm.errorProperty(), "error-text");
    error.setId("findings-error");
    Label status = Widgets.text(vm.statusProperty());
    status.setId("findings-status");
    setBottom(new VBox(4, error, status));
    addEventHandler(KeyEvent.KEY_PRESSED, e -> {
      if (e.isAltDown() || e.isMetaDown()) {
        return;
      }
      if (e.isControlDown()) {
        if (e.getCode() == KeyCode.F) {
          vm.finaliseInspection();
          e.consume();
        }
        return;
      }
      if (e.getCode() == KeyCode.R) {
        vm.issueReport();
        e.consume();
      } else if (e.getCode() == KeyCode.O) {
        vm.issueRepairOrder();
        e.consume();
      } else if (e.getCode() == KeyCode.P) {
        planes.requestFocus();
        planes.show();
        e.consume();
      }
    });
  }

  private VBox side() {
    VBox verdict = Widgets.verdictBox(vm.verdictProperty());
    verdict.setId("findings-verdict");
    VBox repair = Widgets.box("Least set that makes it rigid: frame members, then braces (drawn dash-dot, numbered)", lines(vm.repairLines(), "findings-repair"),
        Widgets.hint("Circle: the design's own position. Square: a new position, a deviation from the design."));
    VBox restore = Widgets.box("Restore to design", lines(vm.restoreLines(), "findings-restore"));
    VBox found = Widgets.box("Found", lines(vm.findingLines(), "findings-found"));

    Button report = wide("Issue inspection report\u2026 (R)");
    report.setId("issue-report");
    report.setOnAction(e -> vm.issueReport());
    Button order = wide("Issue repair order\u2026 (O)");
    order.setId("issue-order");
    order.setOnAction(e -> vm.issueRepairOrder());
    report.disableProperty().bind(vm.busyProperty());
    order.disableProperty().bind(vm.busyProperty());
    ProgressBar bar = new ProgressBar();
    bar.setMaxWidth(Double.MAX_VALUE);
    bar.progressProperty().bind(vm.progressProperty());
    bar.visibleProperty().bind(vm.busyProperty().or(vm.progressProperty().greaterThan(0)));
    bar.managedProperty().bind(bar.visibleProperty());
    Label words = Widgets.text(vm.progressWordsProperty(), "hint");
    words.visibleProperty().bind(vm.progressWordsProperty().isNotEmpty());
    words.managedProperty().bind(words.visibleProperty());
    Label draft = Widgets.hint("An open inspection gives a report marked DRAFT on every page; finalise it for the record.");
    draft.setId("findings-draft-hint");
    // gone once the inspection is finalised (its documents are no longer drafts)
    draft.visibleProperty().bind(vm.finalisedProperty().not());
    draft.managedProperty().bind(draft.visibleProperty());
    VBox docs = Widgets.box("Documents", report, order, bar, words, draft);

    Button finalise = wide("Finalise inspection (Ctrl+F)");
    finalise.setId("finalise");
    finalise.disableProperty().bind(vm.finalisedProperty());
    finalise.setOnAction(e -> vm.finaliseInspection());
    Label done = Widgets.text("Finalised: this inspection is read-only.");
    done.getStyleClass().add("error-text");
    done.visibleProperty().bind(vm.finalisedProperty());
    done.managedProperty().bind(done.visibleProperty());
    done.setId("findings-finalised");
    VBox fin = Widgets.box("Finish", done, finalise,
        Widgets.hint("After finalising nothing in the inspection can change; the database refuses it too."));

    VBox side = new VBox(10, verdict, repair, docs, fin, restore, found);
    side.getStyleClass().add("side");
    return side;
  }

  private static VBox lines(ObservableList<String> items, String id) {
    VBox box = new VBox(4);
    box.setId(id);
    Runnable fill = () -> {
      box.getChildren().clear();
      for (String s : items) {
        box.getChildren().add(Widgets.text(s));
      }
    };
    items.addListener((javafx.collections.ListChangeListener<String>) c -> fill.run());
    fill.run();
    return box;
  }

  private static Button wide(String text) {
    Button b = Widgets.wideButton(text);
    b.setMaxWidth(Double.MAX_VALUE);
    return b;
  }

  public void focusPlane() {
    canvas.requestFocus();
  }

  public static KeyHelp.Section keys() {
    return new KeyHelp.Section(
        "Findings and repair",
        List.of(
            KeyHelp.of("R", "issue the inspection report (PDF)"),
            KeyHelp.of("O", "issue the repair order (PDF and CSV)"),
            KeyHelp.of("P", "choose another plane of the inspection"),
            KeyHelp.of("Ctrl+F", "finalise the inspection (asks first; then read-only)")));
  }

  /** The legend in a strip of at most about three rows that scrolls when it needs more. */
  private static javafx.scene.control.ScrollPane legendStrip(Legend legend) {
    javafx.scene.control.ScrollPane strip = new javafx.scene.control.ScrollPane(legend);
    strip.setFitToWidth(true);
    strip.setHbarPolicy(javafx.scene.control.ScrollPane.ScrollBarPolicy.NEVER);
    strip.setPrefViewportHeight(150);
    strip.setMinViewportHeight(60);
    VBox.setVgrow(strip, Priority.NEVER);
    return strip;
  }
}
