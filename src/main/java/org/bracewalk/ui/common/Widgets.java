package org.bracewalk.ui.common;

import javafx.beans.value.ObservableValue;
import org.bracewalk.app.verdict.Cautions;
import org.bracewalk.app.verdict.VerdictKind;
import javafx.geometry.Pos;
import javafx.scene.Node;
import javafx.scene.control.Button;
import javafx.scene.control.Label;
import javafx.scene.control.Labeled;
import javafx.scene.control.ListCell;
import javafx.scene.layout.FlowPane;
import javafx.scene.layout.HBox;
import javafx.scene.layout.Priority;
import javafx.scene.layout.Region;
import javafx.scene.layout.VBox;

/** Small builders shared by the screens, so every screen looks and behaves alike. */
public final class Widgets {
  private Widgets() {}

  /** A white box with a bold title. */
  public static VBox box(String title, Node... content) {
    Label t = new Label(title);
    t.getStyleClass().add("box-title");
    t.setWrapText(true);
    t.setMinHeight(Region.USE_PREF_SIZE);
    VBox b = new VBox(t);
    b.getChildren().addAll(content);
    b.getStyleClass().add("box");
    return b;
  }

  /** A key cap: the key written in white on black. */
  public static Label key(String k) {
    Label l = new Label(k);
    l.getStyleClass().add("key");
    l.setMinWidth(Region.USE_PREF_SIZE);
    return l;
  }

  /** Wrapped text. */
  public static Label text(String s) {
    Label l = new Label(s);
    l.setWrapText(true);
    l.setMaxWidth(Double.MAX_VALUE);
    l.setMinHeight(Region.USE_PREF_SIZE);
    return l;
  }

  /** Wrapped text bound to a value. */
  public static Label text(ObservableValue<String> value, String... styles) {
    Label l = new Label();
    l.textProperty().bind(value);
    l.setWrapText(true);
    l.setMaxWidth(Double.MAX_VALUE);
    l.setMinHeight(Region.USE_PREF_SIZE);
    l.getStyleClass().addAll(styles);
    return l;
  }

  /** A hint line in smaller grey text. */
  public static Label hint(String s) {
    Label l = text(s);
    l.getStyleClass().add("hint");
    return l;
  }

  /** A row of nodes, centred vertically. */
  public static HBox row(double gap, Node... nodes) {
    HBox h = new HBox(gap, nodes);
    h.setAlignment(Pos.CENTER_LEFT);
    return h;
  }

  /** A gap that takes the free width of a row. */
  public static Region grow() {
    Region r = new Region();
    HBox.setHgrow(r, Priority.ALWAYS);
    return r;
  }

  private static final java.util.List<String> VERDICT_LOOKS = java.util.List.of("holds", "depends", "lost");

  /** A box showing a verdict: its symbol and words in the headline, detail and advice below. */
  public static VBox verdictBox(ObservableValue<VerdictWords> verdict) {
    Label head = new Label();
    head.getStyleClass().add("verdict-headline");
    head.setWrapText(true);
    Label detail = text("");
    Label advice = text("");
    advice.setStyle("-fx-font-weight: bold;");
    Label caution = hint(Cautions.STANDING);
    VBox box = new VBox(head, detail, advice, caution);
    box.getStyleClass().add("verdict");
    Runnable update =
        () -> {
          VerdictWords w = verdict.getValue();
          String look = w == null ? null
              : w.kind().lost() ? "lost" : w.kind() == VerdictKind.HOLDS ? "holds" : "depends";
          // a changed style class restyles the whole box: only touch it when the kind changes
          for (String other : VERDICT_LOOKS) {
            if (!other.equals(look)) {
              box.getStyleClass().remove(other);
            }
          }
          if (look != null && !box.getStyleClass().contains(look)) {
            box.getStyleClass().add(look);
          }
          head.setText(w == null ? "" : w.headline());
          detail.setText(w == null ? "" : w.detail());
          advice.setText(w == null ? "" : w.advice());
        };
    verdict.addListener((o, a, b) -> update.run());
    update.run();
    return box;
  }

  /** A label whose {@code _} letter is an Alt+letter shortcut that moves focus to {@code target}. */
  public static Label mnemonic(String text, Node target) {
    Label l = new Label(text);
    l.setMnemonicParsing(true);
    l.setLabelFor(target);
    // a field's name is short: it keeps its width, the field beside it gives way
    l.setMinWidth(Region.USE_PREF_SIZE);
    return l;
  }

  /**
   * Lets each of {@code labeled} (a label, button, check box) wrap its words onto more lines when
   * it is narrower than its text, and take the height the wrapped text needs, instead of ending in
   * an ellipsis. Returns the first, for chaining.
   */
  @SafeVarargs
  public static <L extends Labeled> L wrap(L... labeled) {
    for (Labeled l : labeled) {
      l.setWrapText(true);
      l.setMinHeight(Region.USE_PREF_SIZE);
    }
    return labeled.length == 0 ? null : labeled[0];
  }

  /** A button that fills its width and wraps its words when narrower than them. */
  public static Button wideButton(String text) {
    Button b = wrap(new Button(text));
    b.setMaxWidth(Double.MAX_VALUE);
    return b;
  }

  /** A row of buttons (or other nodes) that goes onto further lines when the width runs out. */
  public static FlowPane flow(double gap, Node... nodes) {
    FlowPane f = new FlowPane(gap, gap, nodes);
    f.setAlignment(Pos.CENTER_LEFT);
    f.setMinHeight(Region.USE_PREF_SIZE);
    return f;
  }

  /** A list cell whose text wraps to the list's width (the list asks each cell its height at that width). */
  public static <T> ListCell<T> wrappingListCell() {
    ListCell<T> cell = new ListCell<>() {
      @Override
      protected void updateItem(T item, boolean empty) {
        super.updateItem(item, empty);
        setText(empty || item == null ? null : item.toString());
      }
    };
    cell.setWrapText(true);
    cell.setPrefWidth(0); // the list's width, not the longest line, sets the cell's width
    remeasureOnNewFont(cell, cell::getListView);
    return cell;
  }

  private static final Object ROW_FONT = new Object();

  /**
   * A list keeps each row's height once measured; when the text size changes (Ctrl+=),
   * wrapped rows need another height: the rows are measured again, once per new size.
   */
  public static void remeasureOnNewFont(Labeled cell, java.util.function.Supplier<? extends javafx.scene.control.Control> owner) {
    cell.fontProperty().addListener((o, a, font) -> {
      javafx.scene.control.Control c = owner.get();
      if (c == null || font == null || Double.valueOf(font.getSize()).equals(c.getProperties().get(ROW_FONT))) {
        return;
      }
      c.getProperties().put(ROW_FONT, font.getSize());
      if (c instanceof javafx.scene.control.ListView<?> l) {
        l.refresh();
      }
    });
  }

}
