package org.feedernote.report.pdf;

import java.io.IOException;
import java.io.OutputStream;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.concurrent.ArrayBlockingQueue;
import java.util.concurrent.BlockingQueue;
import java.util.zip.Deflater;
import java.util.zip.DeflaterOutputStream;

/**
 * Deflates what is written to it into a file, on a thread of its own, in zlib's format (what a
 * PDF's FlateDecode filter reads): a long trace is compressed for the note while it is still being
 * written, on the second core, instead of afterwards. The file holds the same bytes as one
 * {@link Deflater} of the same level fed everything in one go, because zlib's output does not
 * depend on how its input is divided; OpenPDF compresses an attachment that way, so the note's
 * bytes are the same either way. {@link #finish} waits for the compression and reports a failure
 * of it; {@link #close} deletes the file (and, unfinished, stops the compressing thread): keep the
 * stream open while the file is read.
 */
public final class DeflatingFile extends OutputStream {
    private static final int CHUNK = 1 << 18;
    /** Chunks waiting for the compressing thread: bounds the memory held when it falls behind. */
    private static final int WAITING = 8;

    private record Chunk(byte[] bytes, int length) {}

    private static final Chunk END = new Chunk(new byte[0], 0);

    private final Path file;
    private final BlockingQueue<Chunk> queue = new ArrayBlockingQueue<>(WAITING);
    /** Buffers the compressing thread is done with, for the writing side to fill again (a long trace is thousands of chunks). */
    private final BlockingQueue<byte[]> spare = new ArrayBlockingQueue<>(WAITING + 2);
    private final Thread compressing;
    private volatile IOException failure;
    private byte[] buffer = new byte[CHUNK];
    private int filled;
    private long length;
    private boolean ended;

    /**
     * A new scratch file in the folder (named prefix + random + ".deflated.part"), removed again
     * when the stream is closed or cannot be made, or the run is interrupted (Ctrl-C).
     */
    public static DeflatingFile scratch(Path folder, String prefix, int level) throws IOException {
        Path file = Files.createTempFile(folder, prefix, ".deflated.part");
        file.toFile().deleteOnExit();
        try {
            return new DeflatingFile(file, level);
        } catch (IOException | RuntimeException | Error e) {
            Files.deleteIfExists(file);
            throw e;
        }
    }

    /** Starts the compressing thread; the file is created (or replaced) at once. */
    public DeflatingFile(Path file, int level) throws IOException {
        this.file = file;
        OutputStream target = new java.io.BufferedOutputStream(Files.newOutputStream(file), 1 << 16);
        this.compressing = new Thread(() -> compress(target, level), "feedernote-deflate");
        compressing.setDaemon(true);
        compressing.start();
    }

    private void compress(OutputStream target, int level) {
        Deflater deflater = new Deflater(level);
        try (DeflaterOutputStream out = new DeflaterOutputStream(target, deflater, 1 << 16)) {
            for (Chunk c = take(); c != END; c = take()) {
                if (failure == null) out.write(c.bytes(), 0, c.length());
                spare.offer(c.bytes());
            }
            out.finish();
        } catch (IOException | RuntimeException | Error e) {
            failure = e instanceof IOException io ? io : new IOException(e);
            // Take what is still sent, so that the writing side never waits on a full queue.
            while (take() != END) {
                // discarded
            }
        } finally {
            deflater.end();
        }
    }

    private Chunk take() {
        while (true) {
            try {
                return queue.take();
            } catch (InterruptedException e) {
                // This thread is the stream's own; it ends when END arrives.
            }
        }
    }

    private void send(Chunk c) throws IOException {
        try {
            queue.put(c);
        } catch (InterruptedException e) {
            Thread.currentThread().interrupt();
            throw new java.io.InterruptedIOException("interrupted while compressing " + file);
        }
    }

    @Override public void write(int b) throws IOException {
        refuseIfEnded();
        if (filled == CHUNK) sendFilled();
        buffer[filled++] = (byte) b;
        length++;
    }

    @Override public void write(byte[] b, int off, int len) throws IOException {
        refuseIfEnded();
        length += len;
        while (len > 0) {
            if (filled == CHUNK) sendFilled();
            int n = Math.min(len, CHUNK - filled);
            System.arraycopy(b, off, buffer, filled, n);
            filled += n;
            off += n;
            len -= n;
        }
    }

    private void sendFilled() throws IOException {
        refuseIfEnded();
        if (failure != null) throw failure;
        send(new Chunk(buffer, filled));
        byte[] reused = spare.poll();
        buffer = reused != null ? reused : new byte[CHUNK];
        filled = 0;
    }

    private void refuseIfEnded() throws IOException {
        if (ended) throw new IOException(file + " is already complete");
    }

    /** Waits until everything written is compressed into the file; throws where compressing failed. */
    public void finish() throws IOException {
        refuseIfEnded();
        if (filled > 0) sendFilled();
        end();
        if (failure != null) throw new IOException("cannot compress into " + file + ": " + failure.getMessage(), failure);
    }

    private void end() throws IOException {
        ended = true;
        send(END);
        try {
            compressing.join();
        } catch (InterruptedException e) {
            Thread.currentThread().interrupt();
            throw new java.io.InterruptedIOException("interrupted while compressing " + file);
        }
    }

    /** The number of bytes written (before compression). */
    public long length() {
        return length;
    }

    public Path file() {
        return file;
    }

    /** Deletes the file; unfinished, stops the compressing thread first. */
    @Override public void close() throws IOException {
        try {
            if (!ended) end();
        } finally {
            Files.deleteIfExists(file);
        }
    }
}
