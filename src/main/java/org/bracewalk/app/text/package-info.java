/**
 * Text files in: the one bounded, strict reader every format uses (panel maps, the observation
 * CSV, the site file, the wording templates). Depends on the JDK only, so every reader of the
 * application and the adapters may use it.
 */
package org.bracewalk.app.text;
