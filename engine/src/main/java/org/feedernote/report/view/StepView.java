package org.feedernote.report.view;

/**
 * One worked step as the note shows it. Every text field is already escaped markup (user text
 * included), with symbol subscripts marked up; the template prints them with ?no_esc.
 *
 * @param kind input, lookup, factor, formula, check, decision or note
 */
public record StepView(String number, String kind, String title, String form, String symbolicHtml,
                       String substitutedHtml, String resultHtml, String source, String because, String outcome,
                       String text, boolean pass) {}
