/**
 * The history of a plane: its inspections over time, each drawn with what changed since the one
 * before. Depends on {@code ui.common}, {@code app} and {@code core}; the view model has no
 * scene-graph type.
 */
package org.bracewalk.ui.history;
