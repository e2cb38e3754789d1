package org.arcwright.tolerance;

/** Which end a single-limit dimension bounds ({@code R .060 MAX}, {@code CR .25 MIN}). */
public enum LimitSide {
    MAX,
    MIN
}
