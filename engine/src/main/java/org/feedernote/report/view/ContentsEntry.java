package org.feedernote.report.view;

/** A line of the printed contents: the heading's number and title, and the anchor whose page it shows. */
public record ContentsEntry(String number, String title, String anchor, int level) {}
