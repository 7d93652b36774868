package org.feedernote.model;

/** A distribution board. The origin board has no feeding circuit. */
public record Board(String id, String description, Setting<Double> diversity, Double faultRatingKa, Where where) {}
