package org.bracewalk.ui;

import java.util.List;
import javafx.geometry.Pos;
import javafx.scene.control.Button;
import javafx.scene.control.Label;
import javafx.scene.control.ScrollPane;
import javafx.scene.layout.ColumnConstraints;
import javafx.scene.layout.GridPane;
import javafx.scene.layout.HBox;
import javafx.scene.layout.StackPane;
import javafx.scene.layout.VBox;
import org.bracewalk.ui.common.KeyHelp;
import org.bracewalk.ui.common.Widgets;

/** The keyboard help, laid over the window: every key of every screen. F1 or ? opens it, Esc closes it. */
final class HelpOverlay extends StackPane {

  HelpOverlay(List<KeyHelp.Section> sections, Runnable close) {
    getStyleClass().add("help-overlay");
    setId("help-overlay");
    Label title = new Label("Keys \u2014 everything can be done from the keyboard");
    title.getStyleClass().add("help-title");
    Button closeButton = new Button("Close (Esc)");
    closeButton.setOnAction(e -> close.run());
    HBox head = Widgets.row(10, title, Widgets.grow(), closeButton);

    GridPane columns = new GridPane();
    columns.setHgap(28);
    ColumnConstraints half = new ColumnConstraints();
    half.setPercentWidth(50);
    columns.getColumnConstraints().addAll(half, half);
    VBox left = new VBox(4);
    VBox right = new VBox(4);
    int total = sections.stream().mapToInt(s -> s.lines().size() + 2).sum();
    int used = 0;
    for (KeyHelp.Section s : sections) {
      VBox target = used < total / 2 ? left : right;
      used += s.lines().size() + 2;
      Label h = new Label(s.title());
      h.getStyleClass().add("help-section");
      target.getChildren().add(h);
      GridPane lines = new GridPane();
      lines.setHgap(10);
      lines.setVgap(3);
      ColumnConstraints keyCol = new ColumnConstraints(170, 170, 170);
      ColumnConstraints whatCol = new ColumnConstraints();
      whatCol.setHgrow(javafx.scene.layout.Priority.ALWAYS);
      lines.getColumnConstraints().addAll(keyCol, whatCol);
      int r = 0;
      for (KeyHelp k : s.lines()) {
        Label key = Widgets.key(k.keys());
        key.setWrapText(true);
        key.setMinWidth(0);
        key.setMaxWidth(170);
        Label what = Widgets.text(k.action());
        lines.addRow(r++, key, what);
      }
      target.getChildren().add(lines);
    }
    columns.add(left, 0, 0);
    columns.add(right, 1, 0);
    ScrollPane scroll = new ScrollPane(columns);
    scroll.setFitToWidth(true);
    VBox.setVgrow(scroll, javafx.scene.layout.Priority.ALWAYS);
    VBox card = new VBox(10, head, scroll);
    card.getStyleClass().add("help-card");
    setAlignment(Pos.CENTER);
    getChildren().add(card);
    setOnMouseClicked(e -> {
      if (e.getTarget() == this) {
        close.run();
      }
    });
  }
}
