package org.feedernote.report.view;

/**
 * One step in one line: its number, the quantity's name (and the form chosen), the working
 * (symbolic = substituted = result; symbol = value and the table's row and column; since … → …),
 * and its reference; {@code ditto} where the reference is that of the line above. Escaped markup.
 */
public record LineView(String number, String quantity, String working, String reference, boolean ditto) {}
