package org.feedernote.cli;

import java.io.IOException;
import java.io.OutputStream;
import java.nio.charset.StandardCharsets;
import java.nio.file.AtomicMoveNotSupportedException;
import java.nio.file.Path;
import java.nio.file.StandardCopyOption;

/** Writes files through a temporary file in the target folder, so a killed run leaves no partial file. */
final class Files {
    private Files() {}

    /** Something that writes a file's content. */
    interface Content {
        void writeTo(OutputStream out) throws IOException;
    }

    static void writeAtomically(Path target, String text) throws IOException {
        writeAtomically(target, text.getBytes(StandardCharsets.UTF_8));
    }

    static void writeAtomically(Path target, byte[] bytes) throws IOException {
        writeAtomically(target, out -> out.write(bytes));
    }

    /** Something that writes a file given its path (for writers that go back and patch it). */
    interface FileContent {
        void writeTo(Path file) throws IOException;
    }

    static void writeAtomically(Path target, Content content) throws IOException {
        writeFileAtomically(target, tmp -> {
            try (OutputStream out = new java.io.BufferedOutputStream(java.nio.file.Files.newOutputStream(tmp), 1 << 16)) {
                content.writeTo(out);
            }
        });
    }

    static void writeFileAtomically(Path target, FileContent content) throws IOException {
        Path dir = target.toAbsolutePath().getParent();
        java.nio.file.Files.createDirectories(dir);
        Path tmp = java.nio.file.Files.createTempFile(dir, "." + target.getFileName(), ".part");
        try {
            content.writeTo(tmp);
            try {
                java.nio.file.Files.setPosixFilePermissions(tmp, java.nio.file.attribute.PosixFilePermissions.fromString("rw-r--r--"));
            } catch (UnsupportedOperationException notPosix) {
                // Windows and the like: the default permissions of a new file apply.
            }
            try {
                java.nio.file.Files.move(tmp, target, StandardCopyOption.ATOMIC_MOVE, StandardCopyOption.REPLACE_EXISTING);
            } catch (AtomicMoveNotSupportedException e) {
                java.nio.file.Files.move(tmp, target, StandardCopyOption.REPLACE_EXISTING);
            }
        } finally {
            java.nio.file.Files.deleteIfExists(tmp);
        }
    }
}
