package org.feedernote.report.view;

import java.util.List;

/** Everything the note's templates receive; templates never calculate. */
public record NoteView(CoverView cover, List<BasisRow> basis, List<String> standards, List<String> cautions,
                       List<String> assumptions, List<String> unverified, List<SummaryRow> summary, List<WorkedSection> sections,
                       List<SourceView> documents, List<SourceView> tables, List<SourceView> otherBases,
                       List<ListingLine> listing, String listingName, String fingerprint, String fingerprintShort,
                       boolean draft, String engineVersion, String dataVersion, String runningTitle,
                       String changesSince, List<String> changes, String detail, String detailDescription, List<BoardRow> boards,
                       List<CableView> cables, List<ContentsEntry> contents) {}
