package org.feedernote.report.view;

import java.util.List;

/** A distinct cable's impedance, derived once; the circuits that use it refer to its label. Escaped markup. */
public record CableView(String label, String anchor, String titleHtml, String usedBy, List<LineView> lines) {}
