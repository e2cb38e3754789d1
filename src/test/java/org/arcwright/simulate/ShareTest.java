package org.arcwright.simulate;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

/**
 * Wilson score intervals against the worked examples in R. G. Newcombe, "Two-sided confidence
 * intervals for the single proportion: comparison of seven methods", Statistics in Medicine 17
 * (1998), Table II, method 3 (values from memory, four decimals).
 */
class ShareTest {
    @ParameterizedTest
    @CsvSource({
            "81, 263, 0.2553, 0.3662",
            "15, 148, 0.0624, 0.1605",
            "0, 20, 0.0, 0.1611",
            "1, 29, 0.0061, 0.1718"})
    void wilsonIntervalMatchesPublishedExamples(long k, long n, double low, double high) {
        Share s = Share.of(k, n);
        assertThat(s.low()).isCloseTo(low, within(5e-5));
        assertThat(s.high()).isCloseTo(high, within(5e-5));
        assertThat(s.share()).isEqualTo((double) k / n);
    }
}
