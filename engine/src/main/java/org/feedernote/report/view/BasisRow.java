package org.feedernote.report.view;

/** A design-basis value and whether the input gave it or the stated default applies. */
public record BasisRow(String item, String value, String origin, String basis) {}
