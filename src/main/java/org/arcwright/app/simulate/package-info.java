/**
 * The Simulation view of the selected feature: its candidate callouts (the advisor's recommendations
 * and its chosen callout) judged over a simulated population from the pack's default process model
 * for its process, as one bar per callout (accepted and good, escapes, false rejects, rejected and
 * bad); clicking a bar shows example parts of that kind drawn magnified in the zone by the render
 * core's section plot. Runs in the background with progress and cancel. The simulation is built by
 * {@code services.CaseSimulations}, as {@code advise --simulate} builds it.
 *
 * <p>May import: the JDK, Swing/AWT, MigLayout, FlatLaf, the core packages, {@code services},
 * {@code render}, {@code app.model} and {@code app.widgets}. Registered in the main window by one tab line.
 */
package org.arcwright.app.simulate;
