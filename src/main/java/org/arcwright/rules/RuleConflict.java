package org.arcwright.rules;

/**
 * Two rules of equal weight that can fire on the same case and recommend different controls. The
 * engine never settles such a pair by file order: it reports it, and the pack's author gives one a
 * different weight or narrows its conditions.
 *
 * @param first the rule whose id sorts first
 * @param second the other rule
 * @param weight their common weight
 * @param message the conflict in words
 */
public record RuleConflict(String first, String second, int weight, String message) {}
