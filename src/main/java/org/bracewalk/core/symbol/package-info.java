/**
 * The one set of symbols every drawing and every verdict line uses: the app's plane drawing, the
 * PDF's elevations and key, the text of verdicts and due dates. Each symbol has one shape and one
 * meaning; the README's table of symbols is compared with {@link Symbol} by a test.
 *
 * <p>JDK only, so the screens ({@code ui}) and the PDF renderer ({@code report}) can both read it.
 */
package org.bracewalk.core.symbol;
