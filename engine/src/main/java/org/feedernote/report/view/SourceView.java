package org.feedernote.report.view;

/** A cited source: a document, a table used, or another basis (common practice, design input). */
public record SourceView(String citation, String detail, boolean fromMemory) {}
