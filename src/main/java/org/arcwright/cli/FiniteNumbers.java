package org.arcwright.cli;

import picocli.CommandLine;

/**
 * The one conversion of a command-line number: a finite decimal or nothing. {@code NaN} and
 * {@code Infinity} are words, not sizes; taken as numbers they would switch a check off or be replaced
 * by a default without a word.
 */
final class FiniteNumbers {
    private FiniteNumbers() {}

    static Double parse(String text) {
        String t = text.strip();
        double v;
        try {
            v = Double.parseDouble(t);
        } catch (NumberFormatException e) {
            throw new CommandLine.TypeConversionException("'" + clip(t) + "' is not a number");
        }
        if (!Double.isFinite(v)) {
            throw new CommandLine.TypeConversionException("'" + clip(t) + "' is not a finite number");
        }
        return v;
    }

    private static String clip(String s) {
        return s.length() > 40 ? s.substring(0, 40) + "..." : s;
    }
}
