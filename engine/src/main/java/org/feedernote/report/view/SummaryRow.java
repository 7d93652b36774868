package org.feedernote.report.view;

/** A row of the summary schedule; every figure already formatted from its trace step. */
public record SummaryRow(String circuit, String fromTo, String load, String designCurrent, String deviceRating,
                         String cable, String dropOwn, String dropTotal, String limit, String verdict, boolean pass,
                         String governing, String section) {}
