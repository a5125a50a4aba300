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
import javafx.event.Event;
import javafx.scene.input.KeyCode;
import javafx.scene.input.KeyEvent;
import org.bracewalk.ui.common.KeyHelp;
import org.bracewalk.ui.common.ScreenId;
import org.junit.jupiter.api.AfterAll;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.DynamicContainer;
import org.junit.jupiter.api.DynamicNode;
import org.junit.jupiter.api.DynamicTest;
import org.junit.jupiter.api.TestFactory;
import org.junit.jupiter.api.TestInstance;
import org.testfx.util.WaitForAsyncUtils;

/**
 * Every Alt+letter of every screen reaches its own field: the mnemonics are found in each screen's
 * scene graph (so a new one is covered without touching this test), and for each one, from the
 * screen's starting focus and from the field with the mnemonic before it, Alt+letter must move
 * the focus into the labelled field and type nothing into the field it came from. Each screen's key
 * help names every one of its letters.
 */
@TestInstance(TestInstance.Lifecycle.PER_CLASS)
class MnemonicsFxTest {
  private AppWindowFixture app;

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

  /**
   * Alt+letter as the window system gives it to the scene: pressed, typed (the letter, which a
   * field that kept the focus would take), released, each sent to the focus owner as the scene
   * sends a key. On the JavaFX thread.
   */
  private void pressAlt(char letter) {
    KeyCode code = KeyCode.getKeyCode(String.valueOf(letter));
    String typed = String.valueOf(Character.toLowerCase(letter));
    for (var type : List.of(KeyEvent.KEY_PRESSED, KeyEvent.KEY_TYPED, KeyEvent.KEY_RELEASED)) {
      Node to = app.focusOwner() != null ? app.focusOwner() : app.scene().getRoot();
      boolean isTyped = type == KeyEvent.KEY_TYPED;
      Event.fireEvent(to, new KeyEvent(type, isTyped ? typed : KeyEvent.CHAR_UNDEFINED, isTyped ? "" : typed,
          isTyped ? KeyCode.UNDEFINED : code, false, false, true, false));
    }
  }

  /** What one Alt+letter did: where the focus went, and the text of the field it came from before and after. */
  private record Outcome(boolean reached, String focus, String before, String after) { }

  /** Alt+letter from {@code from} (null: the screen's own starting focus) lands in the mnemonic's field. */
  private void check(ScreenId screen, Mnemonic m, Mnemonic from) throws Exception {
    show(screen);
    Outcome o = WaitForAsyncUtils.asyncFx(() -> {
      // nodes are built afresh when a screen opens: find the mnemonic's label again by its words
      Map<String, Mnemonic> now = new LinkedHashMap<>();
      List<Mnemonic> shown = new ArrayList<>();
      collect(app.scene().getRoot(), shown);
      shown.forEach(x -> now.put(x.label(), x));
      Mnemonic here = now.get(m.label());
      if (here == null) {
        return new Outcome(false, "(the label is gone)", null, null);
      }
      if (from == null) {
        app.window.current().focus();
      } else {
        now.get(from.label()).target().requestFocus();
      }
      Node start = app.focusOwner();
      Node field = start != null && start.getParent() instanceof javafx.scene.control.Spinner<?> sp ? sp : start;
      String before = field == null ? null : text(field);
      pressAlt(m.letter());
      Node focus = app.focusOwner();
      return new Outcome(within(focus, here.target()),
          focus == null ? "nothing" : focus.getClass().getSimpleName() + " " + focus.getId(), before,
          field == null ? null : text(field));
    }).get(60, TimeUnit.SECONDS);
    assertThat(o.reached())
        .as("%s on %s, from %s: the focus went to %s", m, screen.title(), from == null ? "the start" : from, o.focus())
        .isTrue();
    assertThat(o.after()).as("%s on %s typed into the field it came from", m, screen.title()).isEqualTo(o.before());
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
        if (found.size() > 1) {
          // from the field before it (the last field for the first): out of a field being typed in
          Mnemonic other = found.get((found.indexOf(m) + found.size() - 1) % found.size());
          from.add(DynamicTest.dynamicTest("from " + other.label().replace("_", ""), () -> check(id, m, other)));
        }
        tests.add(DynamicContainer.dynamicContainer(m.toString(), from));
      }
      screens.add(DynamicContainer.dynamicContainer(id.title() + " (" + found.size() + " mnemonics)", tests));
    }
    return screens.stream();
  }
}
