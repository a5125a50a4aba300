package org.bracewalk.ui.history;

import java.util.List;
import javafx.geometry.Insets;
import javafx.scene.control.Label;
import javafx.scene.control.ListView;
import javafx.scene.input.KeyCode;
import javafx.scene.input.KeyEvent;
import javafx.scene.layout.BorderPane;
import javafx.scene.layout.Priority;
import javafx.scene.layout.VBox;
import org.bracewalk.ui.common.KeyHelp;
import org.bracewalk.ui.common.Legend;
import org.bracewalk.ui.common.PlaneCanvas;
import org.bracewalk.ui.common.Widgets;

/** The history screen. Only binds to its view model. */
public final class HistoryView extends BorderPane {
  private final ListView<String> list = new ListView<>();

  public HistoryView(HistoryViewModel vm) {
    getStyleClass().add("screen");
    setId("history-screen");
    Label title = new Label();
    title.textProperty().bind(javafx.beans.binding.Bindings.concat("History: ", vm.planeNameProperty()));
    title.getStyleClass().add("screen-title");
    Label timeline = Widgets.text(vm.timelineProperty());
    timeline.setId("history-timeline");
    timeline.setStyle("-fx-font-size: 1.1em; -fx-font-weight: bold;");
    setTop(new VBox(4, title, timeline));
    BorderPane.setMargin(getTop(), new Insets(0, 0, 8, 0));

    PlaneCanvas canvas = new PlaneCanvas();
    canvas.setId("history-canvas");
    canvas.pictureProperty().bind(vm.pictureProperty());
    VBox.setVgrow(canvas, Priority.ALWAYS);
    Label heading = Widgets.text(vm.headingProperty());
    heading.setStyle("-fx-font-weight: bold;");
    // the legend scrolls in a strip of its own, so the drawing keeps the room it needs
    setCenter(new VBox(8, heading, canvas, legendStrip(new Legend(Legend.Set_.HISTORY))));

    list.setId("history-list");
    list.setItems(vm.entries());
    list.setPrefHeight(260);
    list.setCellFactory(l -> Widgets.wrappingListCell()); // an entry's two lines wrap at large text
    list.getSelectionModel().select(vm.chosenProperty().get());
    list.getSelectionModel().selectedIndexProperty().addListener((o, a, b) -> {
      if (b.intValue() >= 0) {
        vm.chosenProperty().set(b.intValue());
      }
    });
    vm.chosenProperty().addListener((o, a, b) -> list.getSelectionModel().select(b.intValue()));
    VBox changes = new VBox(4);
    changes.setId("history-changes");
    Runnable fill = () -> {
      changes.getChildren().clear();
      vm.changes().forEach(s -> changes.getChildren().add(Widgets.text(s)));
    };
    vm.changes().addListener((javafx.collections.ListChangeListener<String>) c -> fill.run());
    fill.run();
    VBox side = new VBox(10,
        Widgets.box("Inspections, oldest first (Up / Down)", list),
        Widgets.box("What changed since the previous inspection (dashed frame, "
            + org.bracewalk.core.symbol.Symbol.CHANGED.glyph() + " in its corner)", changes));
    side.getStyleClass().add("side");
    side.setPrefWidth(400);
    setRight(side);
    addEventHandler(KeyEvent.KEY_PRESSED, e -> {
      if (list.isFocused()) {
        return;
      }
      if (e.getCode() == KeyCode.UP || e.getCode() == KeyCode.LEFT) {
        vm.older();
        e.consume();
      } else if (e.getCode() == KeyCode.DOWN || e.getCode() == KeyCode.RIGHT) {
        vm.newer();
        e.consume();
      }
    });
  }

  public void focusList() {
    list.requestFocus();
  }

  public static KeyHelp.Section keys() {
    return new KeyHelp.Section(
        "History",
        List.of(KeyHelp.of("Up / Down", "older / newer inspection of the plane")));
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
