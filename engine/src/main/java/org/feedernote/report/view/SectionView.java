package org.feedernote.report.view;

import java.util.List;

import org.feedernote.report.Html;

/** A numbered section of worked steps and sub-sections; title and subtitle are plain text. */
public record SectionView(String number, String anchor, String title, String subtitle, boolean newPage,
                          List<StepView> steps, List<SectionView> sections) {
    /** The title as markup: escaped, symbols with their subscripts (U_0 → U<sub>0</sub>). */
    public String titleHtml() {
        return Html.math(title);
    }

    /** The subtitle as markup, like {@link #titleHtml()}. */
    public String subtitleHtml() {
        return subtitle == null ? "" : Html.math(subtitle);
    }
}
