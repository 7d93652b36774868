package org.feedernote.report.view;

/** A printed line of the input listing: the file's line number (empty on a continuation) and the text. */
public record ListingLine(String number, String text) {}
