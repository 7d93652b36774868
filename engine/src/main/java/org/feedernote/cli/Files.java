package org.feedernote.cli;

import java.io.IOException;
import java.io.OutputStream;
import java.nio.charset.StandardCharsets;
import java.nio.file.AtomicMoveNotSupportedException;
import java.nio.file.Path;
import java.nio.file.StandardCopyOption;

/**
 * Writes files through a temporary file in the target folder, so a failed or interrupted run leaves
 * no partial file and the previous file, if any, untouched (a run killed outright, with SIGKILL,
 * may leave the hidden temporary file).
 */
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
        try (Staged staged = stage(target, content)) {
            staged.putInPlace();
        }
    }

    static void writeFileAtomically(Path target, FileContent content) throws IOException {
        try (Staged staged = stageFile(target, content)) {
            staged.putInPlace();
        }
    }

    /**
     * Writes the content into a hidden temporary file beside the target and leaves it there until
     * {@link Staged#putInPlace()}: two files that belong together (a note and its trace) are then
     * put in place one straight after the other, and a run that fails between them replaces neither.
     */
    static Staged stage(Path target, Content content) throws IOException {
        return stageFile(target, tmp -> {
            try (OutputStream out = new java.io.BufferedOutputStream(java.nio.file.Files.newOutputStream(tmp), 1 << 16)) {
                content.writeTo(out);
            }
        });
    }

    static Staged stageFile(Path target, FileContent content) throws IOException {
        Path dir = target.toAbsolutePath().getParent();
        java.nio.file.Files.createDirectories(dir);
        Path tmp = java.nio.file.Files.createTempFile(dir, "." + target.getFileName(), ".part");
        // Removed by the JVM's shutdown too: an interrupted run (Ctrl-C, SIGTERM) leaves nothing behind.
        tmp.toFile().deleteOnExit();
        Staged staged = new Staged(tmp, target);
        try {
            content.writeTo(tmp);
            return staged;
        } catch (IOException | RuntimeException | Error e) {
            staged.close();
            throw e;
        }
    }

    /** A file written in full under a temporary name; closing it without putting it in place removes it. */
    static final class Staged implements AutoCloseable {
        private final Path tmp;
        private final Path target;

        private Staged(Path tmp, Path target) {
            this.tmp = tmp;
            this.target = target;
        }

        void putInPlace() throws IOException {
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
        }

        @Override public void close() throws IOException {
            java.nio.file.Files.deleteIfExists(tmp);
        }
    }
}
