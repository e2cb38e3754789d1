/**
 * Reading and writing the user's files safely: located input errors and atomic writes.
 *
 * <p>Every core package reports bad input through {@link org.arcwright.io.InputProblem}, which names
 * the file, line, column and field so that a user can find and fix the fault. Every file Arcwright
 * saves goes through {@link org.arcwright.io.AtomicFiles}, so a crash or a bad value never leaves a
 * half-written file behind.
 *
 * <p>Every file is read through {@link org.arcwright.io.InputFiles} (regular files only, stated size
 * caps, byte-order mark accepted, strict UTF-8, and a pack's files only from inside its folder), and
 * every output a user names is checked by {@link org.arcwright.io.OutputFiles} before it is written.
 *
 * <p>May import: the JDK and Jackson. Must not import Swing/AWT or print.
 */
package org.arcwright.io;
