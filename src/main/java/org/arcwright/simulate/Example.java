package org.arcwright.simulate;

import org.arcwright.inspect.PointSet;

/**
 * A simulated part kept to show what a callout let through or turned away.
 *
 * @param part the true geometry
 * @param section the measured section the callout judged
 * @param outcome how it fared
 */
public record Example(Part part, PointSet section, Outcome outcome) {}
