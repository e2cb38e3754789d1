/**
 * The Simulation view: a process file's simulated population judged by every candidate callout, as
 * one bar per callout (accepted and good, escapes, false rejects, rejected and bad); clicking a bar
 * shows example parts of that kind, their deviations drawn magnified against the zone. Runs in the
 * background with progress and cancel.
 *
 * <p>May import: the JDK, Swing/AWT, MigLayout and the core packages. Of the core it uses
 * {@code simulate}, {@code inspect}, {@code zone}, {@code tolerance} and {@code io}. Registered in the main window
 * by one tab line.
 */
package org.arcwright.app.simulate;
