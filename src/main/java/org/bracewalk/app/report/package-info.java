/**
 * The inspection report and the crew's repair order as use cases: gather an inspection's records
 * through the ports, run the engine, draw up the repair plan, fingerprint the records in their
 * canonical form (DEVELOPERS.md, "Record fingerprint"), and hand the content to the renderers;
 * check a document's fingerprint against the database. Depends on {@code app}, {@code core} and
 * the ports; never on a PDF library.
 */
package org.bracewalk.app.report;
