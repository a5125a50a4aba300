/**
 * The sites overview: every structure and plane with its latest verdict, when it was last inspected
 * and when the next inspection is due; loading the demo site; starting an inspection. Depends on
 * {@code ui.common}, {@code app} and {@code core}; the view model has no scene-graph type.
 */
package org.bracewalk.ui.sites;
