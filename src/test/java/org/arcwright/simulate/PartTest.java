package org.arcwright.simulate;

import static org.assertj.core.api.Assertions.assertThat;

import org.junit.jupiter.api.Test;

/** A simulated part described in the example lists: fixed places, ties half to even as every figure. */
class PartTest {

    @Test
    void describeWritesFiguresThroughTheOneRule() {
        // ties half to even: ISO 80000-1:2009 Annex B, rule A (from memory)
        Part p = new Part(6, 2.00005, 0.003, 0.004, 0.125, 0.375, 0.01525, true);
        assertThat(p.describe("mm")).isEqualTo("part 7: R 2.0000 mm, flat 12-38 % of the sweep, step 0.0152 mm at leg B, off place 0.0050 mm");
    }
}
