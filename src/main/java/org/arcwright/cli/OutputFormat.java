package org.arcwright.cli;

/** How a command prints its result. */
public enum OutputFormat {
    text,
    json
}
