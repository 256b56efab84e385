package org.headway.app;

import static org.junit.jupiter.api.Assertions.assertEquals;

import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

/** Inputs echoed into the segment table lose padding zeros but keep every digit given (common practice, no source). */
class CompactNumberTest {

    @ParameterizedTest
    @CsvSource({
        "420.0, 420",
        "6.000, 6",
        "1.500, 1.5",
        "0.04600, 0.046",
        "1.500e-5, 1.5e-5",
        "2.0e7, 2e7",
        "120, 120",
        "1.234, 1.234",
        "-3.50, -3.5"
    })
    void paddingZerosAreDropped(String formatted, String shown) {
        assertEquals(shown, ProjectEditor.compact(formatted));
    }
}
