package org.feedernote.report.view;

import java.util.List;

/**
 * A numbered section of worked steps and sub-sections. {@code title} and {@code subtitle} are plain
 * text; {@code titleHtml} and {@code subtitleHtml} the same as markup: escaped, symbols with their
 * subscripts (U_0 → U<sub>0</sub>), the installation's ids as written.
 */
public record SectionView(String number, String anchor, String title, String subtitle, String titleHtml, String subtitleHtml,
                          boolean newPage, List<StepView> steps, List<SectionView> sections) implements WorkedSection {
    @Override public String template() {
        return "section.ftlh";
    }
}
