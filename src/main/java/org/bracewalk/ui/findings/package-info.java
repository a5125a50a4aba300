/**
 * Findings and repair: the least set of braces that restores rigidity drawn on the plane, the
 * restore-to-design list, issuing the report and the repair order off the UI thread, and finalising
 * the inspection. Depends on {@code ui.common}, {@code app} and {@code core}; the view model has no
 * scene-graph type.
 */
package org.bracewalk.ui.findings;
