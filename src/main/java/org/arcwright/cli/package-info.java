/**
 * The command line: one picocli command per job, each a thin caller of a core service.
 *
 * <h2>Conventions</h2>
 * Every command takes {@code --format text|json}; exit code 0 means done (or pass), 1 a failed
 * verdict, 2 bad input or usage with a message on stderr naming the file, line and field. Output
 * goes to the {@link java.io.PrintWriter}s picocli hands in, never to {@code System.out} directly,
 * so commands are testable in-process.
 *
 * <p>May import: the JDK, every core package, {@code org.arcwright.render},
 * {@code org.arcwright.render.plot}, {@code org.arcwright.services}, picocli and Jackson. Must not
 * import Swing.
 */
package org.arcwright.cli;
