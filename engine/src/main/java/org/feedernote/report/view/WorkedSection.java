package org.feedernote.report.view;

/** A worked section of the note: laid out in full ({@link SectionView}) or as a compact block ({@link CompactSectionView}). */
public sealed interface WorkedSection permits SectionView, CompactSectionView {
    /** The template that lays the section out. */
    String template();

    String number();

    String anchor();

    String title();
}
