package org.arcwright.pack;

/** Where a pack sits in the stack; later layers win. */
public enum PackLayer {
    BUILT_IN,
    TEAM,
    PERSONAL
}
