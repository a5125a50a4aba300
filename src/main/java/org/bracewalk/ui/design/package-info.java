/**
 * The design editor: a plane's lifts, bays, sizes, support and the brace of every panel, with fill
 * helpers for common patterns and the design's own verdict live. Depends on {@code ui.common},
 * {@code app} and {@code core}; the view model has no scene-graph type.
 */
package org.bracewalk.ui.design;
