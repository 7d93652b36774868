package org.feedernote.report.view;

import org.feedernote.report.Html;

/** A cited source: a document, a table used, or another basis (common practice, design input). Plain text. */
public record SourceView(String citation, String detail, boolean fromMemory) {
    /** The citation as markup: escaped, symbols with their subscripts (C_a → C<sub>a</sub>). */
    public String citationHtml() {
        return Html.math(citation);
    }

    /** The detail as markup, like {@link #citationHtml()}. */
    public String detailHtml() {
        return Html.math(detail);
    }
}
