package org.feedernote.model;

import java.util.List;

/**
 * The whole design input, read and validated. canonicalJson is the input in canonical form (keys
 * sorted, layout dropped) for the fingerprint and the archive; sourceText is the file as written,
 * for the note's input listing.
 */
public record Installation(String sourceName, Project project, Basis basis, Supply supply, List<Board> boards,
                           List<Circuit> circuits, String canonicalJson, String sourceText) {}
