/**
 * The walk-round: the inspector walks a plane panel by panel, one key or tap per panel, and sees
 * at once what each mark does to the plane. Depends on {@code ui.common}, {@code app} and {@code
 * core}; the view model has no scene-graph type.
 */
package org.bracewalk.ui.walk;
