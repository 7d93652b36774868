package org.feedernote.report.view;

/** A row of the board schedule; every figure formatted from its trace step. */
public record BoardRow(String board, String fedBy, String faultThreePhase, String faultLineNeutral, String loopImpedance,
                       String demand, String diversity, String drop, boolean pass) {}
