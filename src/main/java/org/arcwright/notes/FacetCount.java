package org.arcwright.notes;

/** How many matching notes take one value of a facet. */
public record FacetCount(String value, int count) {}
