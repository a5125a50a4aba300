/**
 * Interfaces the application needs from the outside world: repositories, renderers, a clock.
 * Implemented by {@code store} and {@code report}. Depends on {@code core.model}, and through the
 * report content of {@code core.port.report} on {@code core.analysis}.
 */
package org.bracewalk.core.port;
