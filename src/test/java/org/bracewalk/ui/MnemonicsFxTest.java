package org.bracewalk.ui;

import static org.assertj.core.api.Assertions.assertThat;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.concurrent.TimeUnit;
import java.util.stream.Stream;
import javafx.scene.Node;
import javafx.scene.Parent;
import javafx.scene.control.Labeled;
import javafx.scene.control.TextInputControl;
import javafx.scene.input.KeyCode;
import org.bracewalk.ui.common.KeyHelp;
import org.bracewalk.ui.common.ScreenId;
import org.junit.jupiter.api.AfterAll;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.DynamicContainer;
import org.junit.jupiter.api.DynamicNode;
import org.junit.jupiter.api.DynamicTest;
import org.junit.jupiter.api.TestFactory;
import org.junit.jupiter.api.TestInstance;
import org.testfx.api.FxRobot;
import org.testfx.util.WaitForAsyncUtils;

/**
 * Every Alt+letter of every screen reaches its own field: the mnemonics are found in each screen's
 * scene graph (so a new one is covered without touching this test), and for each one, from the
 * screen's starting focus and from every other field with a mnemonic, Alt+letter must move the
 * focus into the labelled field and type nothing into the field it came from. Each screen's key
 * help names every one of its letters.
 */
@TestInstance(TestInstance.Lifecycle.PER_CLASS)
class MnemonicsFxTest {
  private AppWindowFixture app;
  private final FxRobot robot = new FxRobot();

  /** One mnemonic as found: its letter, the label's words and the field it names. */
  private record Mnemonic(char letter, String label, Node target) {
    @Override
    public String toString() {
      return "Alt+" + letter + " \u2192 " + label.replace("_", "");
    }
  }

  @BeforeAll
  void start() throws Exception {
    app = new AppWindowFixture();
  }

  @AfterAll
  void close() throws Exception {
    app.close();
  }

  private void show(ScreenId id) throws Exception {
    if (app.window.currentScreen() != id) {
      app.open(id, app.facadeInTheOpenInspection());
    }
    assertThat(app.window.currentScreen()).isEqualTo(id);
  }

  /** Every label or control with an Alt+letter in the screen shown, in scene-graph order. */
  private List<Mnemonic> mnemonicsShown() throws Exception {
    return WaitForAsyncUtils.asyncFx(() -> {
      List<Mnemonic> out = new ArrayList<>();
      collect(app.scene().getRoot(), out);
      return out;
    }).get(60, TimeUnit.SECONDS);
  }

  private static void collect(Node n, List<Mnemonic> out) {
    if (n instanceof Labeled l && l.isMnemonicParsing() && l.getText() != null) {
      int at = l.getText().indexOf('_');
      if (at >= 0 && at + 1 < l.getText().length() && Character.isLetterOrDigit(l.getText().charAt(at + 1))) {
        Node target = l instanceof javafx.scene.control.Label label && label.getLabelFor() != null
            ? label.getLabelFor() : l;
        out.add(new Mnemonic(Character.toUpperCase(l.getText().charAt(at + 1)), l.getText(), target));
      }
    }
    if (n instanceof Parent p) {
      for (Node c : p.getChildrenUnmodifiable()) {
        collect(c, out);
      }
    }
  }

  private static boolean within(Node focus, Node target) {
    for (Node n = focus; n != null; n = n.getParent()) {
      if (n == target) {
        return true;
      }
    }
    return false;
  }

  private static String text(Node n) {
    return n instanceof TextInputControl t ? t.getText()
        : n instanceof javafx.scene.control.Spinner<?> s ? s.getEditor().getText() : null;
  }

  private void focus(Node n) throws Exception {
    WaitForAsyncUtils.asyncFx(n::requestFocus).get(60, TimeUnit.SECONDS);
    WaitForAsyncUtils.waitForFxEvents();
  }

  private void pressAlt(char letter) {
    robot.press(KeyCode.ALT).type(KeyCode.getKeyCode(String.valueOf(letter))).release(KeyCode.ALT);
    WaitForAsyncUtils.waitForFxEvents();
  }

  /** Alt+letter from {@code from} (null: the screen's own starting focus) lands in the mnemonic's field. */
  private void check(ScreenId screen, Mnemonic m, Mnemonic from) throws Exception {
    show(screen);
    // nodes are built afresh when a screen opens: find the mnemonic's label again by its words
    Map<String, Mnemonic> now = new LinkedHashMap<>();
    mnemonicsShown().forEach(x -> now.put(x.label(), x));
    Mnemonic here = now.get(m.label());
    assertThat(here).as("%s on %s", m, screen.title()).isNotNull();
    if (from == null) {
      WaitForAsyncUtils.asyncFx(() -> app.window.current().focus()).get(60, TimeUnit.SECONDS);
      WaitForAsyncUtils.waitForFxEvents();
    } else {
      focus(now.get(from.label()).target());
    }
    Node start = app.focusOwner();
    String before = start == null ? null : text(start.getParent() instanceof javafx.scene.control.Spinner<?> s
        ? s : start);
    pressAlt(m.letter());
    Node focus = app.focusOwner();
    assertThat(within(focus, here.target()))
        .as("%s on %s, from %s: the focus went to %s", m, screen.title(), from == null ? "the start" : from,
            focus == null ? "nothing" : focus.getClass().getSimpleName() + " " + focus.getId())
        .isTrue();
    if (before != null) {
      assertThat(text(start.getParent() instanceof javafx.scene.control.Spinner<?> s ? s : start))
          .as("%s on %s typed into the field it came from", m, screen.title()).isEqualTo(before);
    }
  }

  @TestFactory
  Stream<DynamicNode> everyMnemonicOfEveryScreenReachesItsOwnField() throws Exception {
    List<DynamicNode> screens = new ArrayList<>();
    Map<String, KeyHelp.Section> help = new LinkedHashMap<>();
    AppScreens.screenKeys().forEach(s -> help.put(s.title(), s));
    List<String> helpTitles = new ArrayList<>(help.keySet());
    for (ScreenId id : ScreenId.values()) {
      show(id);
      List<Mnemonic> found = mnemonicsShown();
      List<DynamicNode> tests = new ArrayList<>();
      KeyHelp.Section section = help.get(helpTitles.get(id.ordinal()));
      tests.add(DynamicTest.dynamicTest("each letter once, each named in the key help", () -> {
        assertThat(found.stream().map(Mnemonic::letter).distinct().count())
            .as("letters of %s: %s", id.title(), found).isEqualTo(found.size());
        String alt = section.lines().stream().map(KeyHelp::keys).filter(k -> k.startsWith("Alt+"))
            .findFirst().orElse("").toUpperCase(Locale.ROOT);
        for (Mnemonic m : found) {
          assertThat(alt.substring(Math.min(alt.length(), 4)).split("[ ,]+"))
              .as("the %s key help names %s", id.title(), m).contains(String.valueOf(m.letter()));
        }
      }));
      for (Mnemonic m : found) {
        List<DynamicTest> from = new ArrayList<>();
        from.add(DynamicTest.dynamicTest("from the screen's start", () -> check(id, m, null)));
        for (Mnemonic other : found) {
          if (other != m) {
            from.add(DynamicTest.dynamicTest("from " + other.label().replace("_", ""), () -> check(id, m, other)));
          }
        }
        tests.add(DynamicContainer.dynamicContainer(m.toString(), from));
      }
      screens.add(DynamicContainer.dynamicContainer(id.title() + " (" + found.size() + " mnemonics)", tests));
    }
    return screens.stream();
  }
}
