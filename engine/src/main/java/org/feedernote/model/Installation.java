package org.feedernote.model;

import java.util.List;

/** The whole design input, read and validated. */
public record Installation(String sourceName, Project project, Basis basis, Supply supply, List<Board> boards,
                           List<Circuit> circuits) {}
