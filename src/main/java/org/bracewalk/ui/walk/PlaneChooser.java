package org.bracewalk.ui.walk;

import java.util.List;
import java.util.Objects;
import java.util.function.LongConsumer;
import javafx.geometry.Insets;
import javafx.geometry.Pos;
import javafx.scene.control.ChoiceBox;
import javafx.scene.control.Label;
import javafx.scene.layout.HBox;
import javafx.scene.layout.Priority;
import org.bracewalk.app.PlaneProgress;
import org.bracewalk.core.model.Inspection;
import org.bracewalk.ui.common.LineOrStack;
import org.bracewalk.ui.common.Widgets;
import org.bracewalk.ui.common.WrappingChoiceBox;

/**
 * The bar above the walk-round: the inspection, and the chooser of its planes (Ctrl+P), each with
 * its progress ("15 of 50 panels") and verdict, so a second plane is not missed. The plane walked
 * now follows the marks as they are stored; the others are as read when the walk-round opened.
 */
public final class PlaneChooser extends HBox {
  private final Label who = new Label();
  private final ChoiceBox<PlaneProgress> choice = new WrappingChoiceBox<>();

  /**
   * @param inspection the inspection walked
   * @param planes every plane it covers, with its progress and verdict as read
   * @param current the plane walked now
   * @param vm the walk-round of {@code current} (its progress and verdict, live)
   * @param open opens the walk-round of another plane, by id
   */
  public PlaneChooser(Inspection inspection, List<PlaneProgress> planes, long current, WalkViewModel vm,
      LongConsumer open) {
    super(10);
    Objects.requireNonNull(vm, "vm");
    choice.setId("plane-choice");
    choice.getItems().setAll(planes);
    choice.setConverter(new javafx.util.StringConverter<>() {
      @Override
      public String toString(PlaneProgress p) {
        return p == null ? "" : p.line();
      }

      @Override
      public PlaneProgress fromString(String t) {
        return null;
      }
    });
    Runnable live = () -> {
      for (int i = 0; i < choice.getItems().size(); i++) {
        PlaneProgress p = choice.getItems().get(i);
        if (p.plane().id() == current && vm.verdict() != null) {
          int done = vm.doneProperty().get();
          PlaneProgress now = new PlaneProgress(p.plane(), done, Math.min(p.notReachable(), done), p.total(),
              vm.verdict().kind());
          if (!now.equals(p)) {
            choice.getItems().set(i, now);
          }
          choice.setValue(choice.getItems().get(i));
        }
      }
    };
    live.run();
    vm.doneProperty().addListener((o, a, b) -> live.run());
    vm.verdictProperty().addListener((o, a, b) -> live.run());
    choice.setOnAction(e -> {
      if (choice.getValue() != null && choice.getValue().plane().id() != current) {
        open.accept(choice.getValue().plane().id());
      }
    });
    choice.setFocusTraversable(false);
    // the list shows each line in full; the box shows the chosen line whole, on two lines (or
    // more) where the bar is narrower than the line
    choice.setPrefWidth(330);
    choice.setMaxWidth(Double.MAX_VALUE);
    HBox.setHgrow(choice, Priority.ALWAYS);
    who.setText(inspectionWords(inspection));
    who.setId("walk-inspection");
    Widgets.wrap(who);
    long left = planes.stream().filter(p -> p.plane().id() != current && p.notLookedAt() > 0).count();
    Label others = new Label(left == 0 ? "" : left == 1 ? "+1 plane to walk" : "+" + left + " planes to walk");
    others.setId("plane-others");
    others.setMinWidth(Label.USE_PREF_SIZE);
    others.setStyle("-fx-font-weight: bold;");
    Label plane = new Label("Plane (Ctrl+P):");
    plane.setMinWidth(Label.USE_PREF_SIZE);
    HBox chooser = new HBox(10, others, plane, choice);
    chooser.setAlignment(Pos.CENTER_RIGHT);
    // the inspection and the chooser side by side where both fit, else the chooser below
    LineOrStack bar = new LineOrStack(10, who, chooser);
    HBox.setHgrow(bar, Priority.ALWAYS);
    getChildren().add(bar);
    setAlignment(Pos.CENTER_LEFT);
    setPadding(new Insets(12, 12, 0, 12));
  }

  /** How the bar names the inspection: by whom, why, open or finalised. */
  public static String inspectionWords(Inspection inspection) {
    return "Inspection " + inspection.id() + " by " + inspection.inspectorName() + " \u00b7 "
        + inspection.reason().label().replace('-', ' ')
        + (inspection.isFinalised() ? " \u00b7 finalised (read-only)" : " \u00b7 open");
  }

  /** The inspection as read again (finalised elsewhere, say): the bar names its state now. */
  public void inspectionChanged(Inspection now) {
    who.setText(inspectionWords(now));
  }

  /** Opens the list of planes (Ctrl+P). */
  public void show() {
    choice.show();
  }
}
