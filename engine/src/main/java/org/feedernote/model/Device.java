package org.feedernote.model;

/** The protective device at the origin of a circuit. ratingA is null for 'auto'. */
public record Device(DeviceKind kind, Double ratingA, Curve curve, Double instantaneousA, Double breakingCapacityKa,
                     Double disconnectionCurrentA, Double rcdResidualA, Double letThroughA2s) {}
