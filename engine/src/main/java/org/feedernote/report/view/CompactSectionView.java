package org.feedernote.report.view;

import java.util.List;

/**
 * A worked section as one compact block: the inputs (two short ones to a line), then every other step in one line
 * (grouped under the sub-section titles of the full working, numbered as there), then the checks as
 * a table. The cable's impedance, where the circuit has one, is given once per distinct cable in the
 * cable-data section and referred to by {@code cableRef}. Every text field is escaped markup.
 */
public record CompactSectionView(String number, String anchor, String title, String titleHtml, String subtitleHtml, boolean newPage,
                                 List<List<InputRow>> inputs, List<LineGroup> groups, List<CheckRow> checks) implements WorkedSection {
    @Override public String template() {
        return "compact.ftlh";
    }

    /** An input of the section: quantity, symbol = value, where it comes from (given key, or the default and its basis). */
    public record InputRow(String number, String quantity, String value, String origin) {}

    /**
     * The steps of one sub-section of the full working, each in one line, laid out in rows of one
     * line or of two short ones side by side; {@code cableRef} set where they are given in the cable
     * data instead.
     */
    public record LineGroup(String number, String titleHtml, String subtitleHtml, List<List<LineView>> rows, String cableRef) {}

    /** A check: value, comparison, limit, verdict; {@code governing} marks the check with the least margin of a passing circuit. */
    public record CheckRow(String number, String title, String value, String comparison, String limit, boolean pass, boolean governing,
                           String reference) {}
}
