/**
 * Reading and writing the user's files safely: located input errors and atomic writes.
 *
 * <p>Every core package reports bad input through {@link org.arcwright.io.InputProblem}, which names
 * the file, line, column and field so that a user can find and fix the fault. Every file Arcwright
 * saves goes through {@link org.arcwright.io.AtomicFiles}, so a crash or a bad value never leaves a
 * half-written file behind.
 *
 * <p>May import: the JDK and Jackson. Must not import Swing/AWT or print.
 */
package org.arcwright.io;
