package org.feedernote.trace;

import java.util.List;

/** A titled group of steps and sub-sections, in the order a hand calculation goes. */
public record Section(String id, String title, String subtitle, List<Step> steps, List<Section> sections) {}
