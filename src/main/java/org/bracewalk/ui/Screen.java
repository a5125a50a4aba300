package org.bracewalk.ui;

import javafx.scene.Node;
import org.bracewalk.ui.common.Selection;

/** One built screen: its node, where it is (for the header), and where keyboard focus starts. */
public interface Screen {
  Node node();

  /** "Site › Structure › Plane" for the header. */
  String crumbs();

  /**
   * The header's words as they change (a save as a new plane, an inspection finalised); by
   * default the fixed {@link #crumbs()}.
   */
  default javafx.beans.value.ObservableValue<String> crumbsValue() {
    return new javafx.beans.property.ReadOnlyStringWrapper(crumbs());
  }

  /**
   * Asked before another screen opens or the window closes: false keeps this screen (say, the
   * person chose to stay with unsaved changes). By default true.
   */
  default boolean mayLeave() {
    return true;
  }

  /**
   * The record has changed ({@code source} made the change: a view model, or the shell): read
   * again what is shown. By default nothing (the screen shows nothing another write changes).
   */
  default void reread(Object source) {
  }

  /** Puts keyboard focus where the screen's work starts. */
  void focus();

  /**
   * What the screen has selected, when the person can change it on the screen (the overview);
   * {@code null} when the screen shows the selection it was opened with.
   */
  default javafx.beans.value.ObservableValue<Selection> selection() {
    return null;
  }

  /** A screen with nothing to focus but itself. */
  static Screen of(Node node, String crumbs) {
    return of(node, crumbs, node::requestFocus, null);
  }

  /**
   * A screen whose keyboard focus starts where {@code focus} puts it, showing {@code selection}
   * ({@code null} for the selection it was opened with).
   */
  static Screen of(Node node, String crumbs, Runnable focus,
      javafx.beans.value.ObservableValue<Selection> selection) {
    return new Screen() {
      @Override
      public Node node() {
        return node;
      }

      @Override
      public String crumbs() {
        return crumbs;
      }

      @Override
      public void focus() {
        focus.run();
      }

      @Override
      public javafx.beans.value.ObservableValue<Selection> selection() {
        return selection;
      }
    };
  }
}
