package org.feedernote.calc;

import static org.junit.jupiter.api.Assertions.*;

import java.util.stream.Stream;

import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.MethodSource;

import org.feedernote.data.ReferenceData;
import org.feedernote.verification.PublishedCases;
import org.feedernote.verification.PublishedCases.ReactanceRow;

/**
 * Three-phase flat groups: Table 4D1B prints the drop between the two outer phases (s_g = 2s),
 * Table 4E1B the mean of the three phases (s_g = ³√2·s). The 4E1B flat rows are compared with the
 * derived mean (the published cases XG-…, {@code PublishedCasesTest}); the design uses the outer
 * pair, and its x is held at or above the table's mean here. The printed values are those of
 * {@link PublishedCases#reactanceRows()}, each with its source.
 */
class PublishedReactanceTest {

    static Stream<ReactanceRow> tabulatedAsTheMeanOfThePhases() {
        return PublishedCases.reactanceRows().stream().filter(ReactanceRow::meanOfPhases);
    }

    @ParameterizedTest(name = "BS 7671 {0}")
    @MethodSource("tabulatedAsTheMeanOfThePhases")
    void theDesignsOuterPairReactanceIsNotBelowTheTablesMean(ReactanceRow row) {
        double design = row.derive(ReferenceData.standard(), CableImpedance.FlatGroup.OUTER_PAIR).x().value();
        assertTrue(design >= row.published(), () -> "the design's x (outer phases) " + design + " is not below the table's mean "
                + row.printed() + " (" + row.source().text() + ")");
    }
}
