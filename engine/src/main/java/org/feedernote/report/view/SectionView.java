package org.feedernote.report.view;

import java.util.List;

/** A numbered section of worked steps and sub-sections. */
public record SectionView(String number, String anchor, String title, String subtitle, boolean newPage,
                          List<StepView> steps, List<SectionView> sections) {}
