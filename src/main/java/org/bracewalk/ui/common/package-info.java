/** Widgets and services shared by the screens: dialogs, the UI executor, the plane drawing. */
package org.bracewalk.ui.common;
