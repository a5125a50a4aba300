/**
 * Damage limits for racking members: a measured bow judged against its limit, with the action and
 * the date it falls due. Pure functions; depends on {@code core.port.report} for the result type.
 */
package org.bracewalk.app.damage;
