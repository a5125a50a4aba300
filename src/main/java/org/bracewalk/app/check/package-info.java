/**
 * The {@code check} use case: a design panel map, optionally an as-built one, and a support
 * choice in; the engine's analysis of the plane out. Reads the files, checks that the two maps fit
 * together (every misfit named by file, line and column) and runs the engine.
 *
 * <p>Depends on {@code app.panelmap}, {@code core.analysis} and {@code core.model}.
 */
package org.bracewalk.app.check;
