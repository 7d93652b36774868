package org.feedernote.report.view;

import java.util.List;

/** The cover: title block, stamp, signatures and revision history. */
public record CoverView(String title, String reference, String revision, String date, String client, String status,
                        String verdict, String verdictDetail, boolean conforms, List<Signature> signatures,
                        List<RevisionRow> revisions, List<String> notPerformed, int circuits, int checks) {
    public record Signature(String role, String name) {}
    public record RevisionRow(String revision, String date, String description) {}
}
