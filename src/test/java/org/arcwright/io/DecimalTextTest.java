package org.arcwright.io;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

/**
 * The ways a number is written. Expected texts are worked by hand; the tie rule (half to even)
 * is ISO 80000-1:2009 Annex B, rule A (from memory); no exponent and no trailing zeros on a report
 * are common practice.
 */
class DecimalTextTest {

    @ParameterizedTest(name = "exact({0}) = {1}")
    @CsvSource({
            "0.5, 0.5",
            "0.550, 0.55",
            "2.0, 2",
            "-0.0, 0",
            "0, 0",
            "1200, 1200",
            "1e-5, 0.00001",        // Double.toString gives 1.0E-5; a message must not
            "1.5e7, 15000000",
            "0.1, 0.1",             // the decimal the double prints as, not its binary expansion
            "-12.25, -12.25",
    })
    void exactWritesEveryDigitTheValueWasGivenWith(double v, String expected) {
        assertEquals(expected, DecimalText.exact(v));
    }

    @ParameterizedTest(name = "significant({0}, {1}) = {2}")
    @CsvSource({
            "1.23456, 4, 1.235",
            "2.0, 4, 2",
            "0.000123456, 4, 0.0001235",
            "12345.6, 4, 12350",
            "12345, 4, 12340",      // a tie: half to even
            "12355, 4, 12360",      // a tie: half to even
            "0.12345, 4, 0.1234",   // a tie on the printed decimal, not the binary value just above it
            "-3.14159, 3, -3.14",
            "0, 4, 0",
            "999.96, 4, 1000",
            "1e-5, 4, 0.00001",
    })
    void significantRoundsToTheDigitsAndTrims(double v, int digits, String expected) {
        assertEquals(expected, DecimalText.significant(v, digits));
    }

    @ParameterizedTest(name = "places({0}, {1}) = {2}")
    @CsvSource({
            "1.2004, 3, 1.2",
            "1.2345, 3, 1.234",     // a tie: half to even
            "1.2355, 3, 1.236",
            "0.125, 2, 0.12",
            "2.675, 2, 2.68",       // the typed decimal, not the binary 2.67499...
            "-0.0004, 3, 0",        // no negative zero in a drawing file
            "150, 3, 150",
            "7.5, 0, 8",
    })
    void placesRoundsToAtMostThePlacesAndTrims(double v, int places, String expected) {
        assertEquals(expected, DecimalText.places(v, places));
    }

    @ParameterizedTest(name = "fixed({0}, {1}) = {2}")
    @CsvSource({
            "1.2, 3, 1.200",
            "0.125, 2, 0.12",
            "0.135, 2, 0.14",
            "2, 0, 2",
            "-0.001, 2, 0.00",
            "1234.5678, 1, 1234.6",
    })
    void fixedKeepsThePlacesForAColumn(double v, int places, String expected) {
        assertEquals(expected, DecimalText.fixed(v, places));
    }

    @ParameterizedTest(name = "percent({0}, {1}) = {2}")
    @CsvSource({
            "0.0725, 2, 7.25",      // 100 * 0.0725 is 7.249999999999999 in binary; the share is not
            "0.0725, 1, 7.2",       // a tie: half to even
            "0.0735, 1, 7.4",
            "0.83165, 2, 83.16",    // 16,633 of 20,000 parts: a tie
            "0.5, 2, 50.00",
            "1, 0, 100",
            "0, 2, 0.00",
            "0.00001, 2, 0.00",
    })
    void percentMovesThePointOfTheShare(double share, int places, String expected) {
        assertEquals(expected, DecimalText.percent(share, places));
    }

    @Test
    void nonFiniteValuesAreNamedAndNeverReadBack() {
        for (String s : new String[] {DecimalText.exact(Double.NaN), DecimalText.significant(Double.POSITIVE_INFINITY, 4),
                DecimalText.places(Double.NEGATIVE_INFINITY, 3), DecimalText.fixed(Double.NaN, 2)}) {
            assertTrue(!DecimalText.isDecimal(s), s);
        }
        assertEquals("NaN", DecimalText.exact(Double.NaN));
        assertEquals("-Infinity", DecimalText.places(Double.NEGATIVE_INFINITY, 3));
    }

    @Test
    void whatIsWrittenReadsBackInTheOneSyntax() {
        double[] values = {0.5, 1e-9, 123456789.125, -0.0625, 3.0, 1e20};
        for (double v : values) {
            assertEquals(v, DecimalText.parseFinite(DecimalText.exact(v)), "exact " + v);
            assertTrue(DecimalText.isDecimal(DecimalText.significant(v, 4)), "significant " + v);
            assertTrue(DecimalText.isDecimal(DecimalText.places(v, 3)), "places " + v);
            assertTrue(DecimalText.isDecimal(DecimalText.fixed(v, 2)), "fixed " + v);
        }
    }

    @Test
    void impossibleDigitCountsAreRefused() {
        assertThrows(IllegalArgumentException.class, () -> DecimalText.significant(1, 0));
        assertThrows(IllegalArgumentException.class, () -> DecimalText.places(1, -1));
        assertThrows(IllegalArgumentException.class, () -> DecimalText.fixed(1, -1));
    }
}
