package org.feedernote.data;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.HashSet;
import java.util.Set;
import java.util.stream.Collectors;
import java.util.stream.Stream;

import org.junit.jupiter.api.Test;

import org.feedernote.Fixtures;

/**
 * Every CSV of the data folder is loaded: either hashed into {@link ReferenceData#version()} (the
 * tables the calculation uses) or listed as not yet calculated with, so that a new file cannot be
 * forgotten; and each names its provenance.
 */
class ReferenceFilesTest {
    @Test
    void everyDataFileIsRegisteredOnce() throws IOException {
        Path folder = Fixtures.root().resolve("engine/src/main/resources/org/feedernote/data");
        Set<String> files;
        try (Stream<Path> s = Files.list(folder)) {
            files = s.map(p -> p.getFileName().toString()).filter(n -> n.endsWith(".csv")).collect(Collectors.toSet());
        }
        Set<String> registered = new HashSet<>(ReferenceData.TABLE_FILES);
        for (String f : ReferenceData.NOT_YET_CALCULATED_FILES) assertTrue(registered.add(f), f + " is registered twice");
        assertEquals(files, registered);
    }

    @Test
    void tablesNotYetCalculatedWithLeaveTheVersionAlone() {
        ReferenceData data = ReferenceData.standard();
        assertEquals(ReferenceData.TABLE_FILES.size(), data.tables().size());
        assertEquals(ReferenceData.NOT_YET_CALCULATED_FILES.size(), data.notYetCalculatedTables().size());
        for (ReferenceTable t : data.notYetCalculatedTables()) {
            assertFalse(data.tables().contains(t));
            assertFalse(t.ref().source().isEmpty() || t.ref().edition().isEmpty() || t.ref().table().isEmpty(), t.ref().id());
            assertFalse(t.header().getOrDefault("notes", "").isEmpty(), t.ref().id() + " says what it was checked against");
        }
    }
}
