/**
 * The jar's entry point, {@link org.arcwright.Launch}: the desktop window or the command line.
 *
 * <p>May import: the JDK, {@code java.awt} (to ask whether there is a display), {@code org.arcwright.app}
 * and {@code org.arcwright.cli}.
 */
package org.arcwright;
