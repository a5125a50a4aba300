/** The composition root: the only place that constructs store, report, ui and cli objects. */
package org.bracewalk.boot;
