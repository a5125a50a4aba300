/** The JavaFX application: one sub-package per screen, each an XxxView and an XxxViewModel. */
package org.bracewalk.ui;
