package org.feedernote.data;

import static org.feedernote.data.TableCells.confirmed;
import static org.feedernote.data.TableCells.recalled;
import static org.feedernote.data.TableCells.rows;

import org.junit.jupiter.api.Test;

/** mccb-releases.csv: IEC 60947-2:2016 8.3.3.1.2 and Table 6, every cell. */
class MccbReleasesTableTest {
    private static final ReferenceTable T = TableCells.table("mccb-releases.csv");
    private static final String FAQ = "IEC 60947-2 Table 6 as quoted in the Schneider Electric FAQ FA369327 (se.com/in/en/faqs/FA369327/)";

    @Test
    void inverseTimeMultiplesAreTable6() {
        rows(T, "instantaneous_tolerance", "short_time_tolerance", "non_tripping_multiple", "tripping_multiple",
                "conventional_time_up_to_63a_h", "conventional_time_over_63a_h");
        confirmed(T, "non_tripping_multiple", "value", 1.05, FAQ + ": conventional non-tripping current 1.05 × I_n");
        confirmed(T, "tripping_multiple", "value", 1.30, FAQ + ": conventional tripping current 1.3 × I_n");
        confirmed(T, "conventional_time_up_to_63a_h", "value", 1, FAQ + ": conventional time 1 h (circuit-breakers up to 63 A)");
    }

    @Test
    void tolerancesAndTheLongerTimeAreRecalled() {
        // From memory: IEC 60947-2 8.3.3.1.2 (±20 % of the setting) and Table 6 (2 h above 63 A); no copy seen.
        recalled(T, "instantaneous_tolerance", "value", 0.2);
        recalled(T, "short_time_tolerance", "value", 0.2);
        recalled(T, "conventional_time_over_63a_h", "value", 2);
    }
}
