/**
 * The vocabulary of Bracewalk: brace planes, panels, diagonals, member kinds, design and as-built
 * states, and the site records around them. Records and enums only; depends on the JDK alone.
 */
package org.bracewalk.core.model;
