package org.feedernote.model;

import java.util.List;

/** Title block of the note. */
public record Project(String title, String reference, String revision, String date, String client,
                      String preparedBy, String checkedBy, String approvedBy, Status status,
                      List<Revision> revisions) {
    public record Revision(String revision, String date, String description) {}
}
