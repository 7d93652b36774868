package org.feedernote.calc;

import java.util.List;

import org.feedernote.trace.Q;

/** A board: the cumulative voltage drop from the origin to it and its demand per phase. */
public record BoardResult(String id, String description, String fedBy, Q dropPercent, List<Q> phaseCurrents,
                          Q neutralCurrent) {}
