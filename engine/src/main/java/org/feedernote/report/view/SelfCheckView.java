package org.feedernote.report.view;

import java.util.List;

/** The self-verification report as the template shows it; every text already escaped markup. */
public record SelfCheckView(String engineVersion, String dataVersion, List<String> cautions, List<Row> rows, long passed, int total,
                            boolean allPass) {

    /** One published case: figures formatted, the source and quantity as markup. */
    public record Row(String id, String quantity, String source, String expected, String computed, String tolerance, boolean pass,
                      String problem) {}
}
