/**
 * Interfaces the application needs from the outside world: repositories, renderers, a clock.
 * Implemented by {@code store} and {@code report}. Depends on {@code core.model} only.
 */
package org.bracewalk.core.port;
