package org.bracewalk.ui.common;

import static org.assertj.core.api.Assertions.assertThat;

import javafx.scene.Scene;
import javafx.scene.control.Label;
import javafx.scene.layout.StackPane;
import javafx.scene.layout.VBox;
import org.bracewalk.bench.HeadlessFx;
import org.junit.jupiter.api.Test;

/** A box that remembers its heights must still answer as a plain box does after its content changes. */
class SteadyBoxTest {

  private static Label wrapped(String text) {
    Label l = new Label(text);
    l.setWrapText(true);
    return l;
  }

  @Test
  void remembersHeightsOnlyUntilItsContentChanges() {
    HeadlessFx.start();
    double[][] h = HeadlessFx.onFx(() -> {
      String words = "Keep people and loads off the named lifts and bays until a competent person has acted.";
      Label steadyText = wrapped(words);
      Label plainText = wrapped(words);
      SteadyBox steady = new SteadyBox(4, steadyText);
      VBox plain = new VBox(4, plainText);
      new Scene(new StackPane(steady, plain), 400, 300).getRoot().applyCss();
      double[] before = {steady.prefHeight(120), plain.prefHeight(120), steady.prefHeight(300), plain.prefHeight(300),
          steady.minHeight(120), plain.minHeight(120)};
      // more words: both must grow, the remembered heights forgotten
      steadyText.setText(words + " " + words + " " + words);
      plainText.setText(words + " " + words + " " + words);
      steady.getScene().getRoot().applyCss();
      double[] after = {steady.prefHeight(120), plain.prefHeight(120), steady.prefHeight(300), plain.prefHeight(300),
          steady.minHeight(120), plain.minHeight(120)};
      // larger text for a touch screen (the A+ key scales the root's font): heights follow
      steady.getScene().getRoot().setStyle("-fx-font-size: 24px;");
      steady.getScene().getRoot().applyCss();
      double[] larger = {steady.prefHeight(120), plain.prefHeight(120), steady.prefHeight(300), plain.prefHeight(300),
          steady.minHeight(120), plain.minHeight(120)};
      return new double[][] {before, after, larger};
    });
    for (double[] row : h) {
      assertThat(row[0]).isEqualTo(row[1]);
      assertThat(row[2]).isEqualTo(row[3]);
      assertThat(row[4]).isEqualTo(row[5]);
    }
    assertThat(h[1][0]).as("taller at 120 px after the text grew").isGreaterThan(h[0][0]);
    assertThat(h[2][0]).as("taller again in a larger font").isGreaterThan(h[1][0]);
    assertThat(h[0][0]).as("narrower means taller").isGreaterThan(h[0][2]);
  }
}
