package org.feedernote.report;

import java.nio.charset.StandardCharsets;
import java.util.regex.Matcher;
import java.util.regex.Pattern;

/**
 * Makes a PDF's bytes a function of its content. OpenPDF writes the wall-clock time, a random
 * document id and random six-letter font-subset tags; each is replaced by a value of the same
 * length derived from the fingerprint and the note's date, so every byte offset (and the
 * cross-reference table) stays valid.
 */
final class Determinism {
    private static final Pattern DATE = Pattern.compile("D:\\d{14}([+\\-Z])(\\d{2})?'?(\\d{2})?'?");
    private static final Pattern ID = Pattern.compile("/ID\\s*\\[\\s*<([0-9A-Fa-f]+)>\\s*<([0-9A-Fa-f]+)>\\s*\\]");
    private static final Pattern SUBSET = Pattern.compile("/([A-Z]{6})\\+");

    private Determinism() {}

    static byte[] pin(byte[] pdf, String fingerprint, String isoDate) {
        return pin(pdf, 0, fingerprint, isoDate);
    }

    /**
     * Pins the part of a PDF from {@code from} on: OpenPDF writes the dates, the document id and
     * the font subsets only when the document closes, so the pages before that need no scan.
     */
    static byte[] pin(byte[] pdf, int from, String fingerprint, String isoDate) {
        byte[] tail = pinText(new String(pdf, from, pdf.length - from, StandardCharsets.ISO_8859_1), fingerprint, isoDate);
        byte[] out = pdf.clone();
        System.arraycopy(tail, 0, out, from, tail.length);
        return out;
    }

    /** Pins a PDF file in place from {@code from} on (the replacements keep every length). */
    static void pin(java.nio.file.Path file, long from, String fingerprint, String isoDate) throws java.io.IOException {
        try (java.io.RandomAccessFile f = new java.io.RandomAccessFile(file.toFile(), "rw")) {
            byte[] tail = new byte[Math.toIntExact(f.length() - from)];
            f.seek(from);
            f.readFully(tail);
            byte[] pinned = pinText(new String(tail, StandardCharsets.ISO_8859_1), fingerprint, isoDate);
            f.seek(from);
            f.write(pinned);
        }
    }

    private static byte[] pinText(String text, String fingerprint, String isoDate) {
        // ISO-8859-1 maps bytes to chars one to one, so offsets are preserved.
        String stamp = isoDate.replace("-", "") + "000000";
        Matcher d = DATE.matcher(text);
        StringBuilder b = new StringBuilder();
        while (d.find()) {
            String original = d.group();
            String replacement = ("D:" + stamp + original.substring(16));
            d.appendReplacement(b, Matcher.quoteReplacement(replacement));
        }
        d.appendTail(b);
        text = b.toString();

        Matcher id = ID.matcher(text);
        b = new StringBuilder();
        while (id.find()) {
            String hex = fit(fingerprint.toUpperCase(), id.group(1).length());
            String original = id.group();
            String replaced = original.replace(id.group(1), hex).replace(id.group(2), hex);
            id.appendReplacement(b, Matcher.quoteReplacement(replaced));
        }
        id.appendTail(b);
        text = b.toString();

        Matcher s = SUBSET.matcher(text);
        b = new StringBuilder();
        java.util.Map<String, String> tags = new java.util.LinkedHashMap<>();
        while (s.find()) {
            String tag = tags.computeIfAbsent(s.group(1), k -> subsetTag(fingerprint, tags.size()));
            s.appendReplacement(b, "/" + tag + "+");
        }
        s.appendTail(b);
        return b.toString().getBytes(StandardCharsets.ISO_8859_1);
    }

    private static String fit(String hex, int length) {
        StringBuilder b = new StringBuilder();
        while (b.length() < length) b.append(hex);
        return b.substring(0, length);
    }

    private static String subsetTag(String fingerprint, int index) {
        StringBuilder tag = new StringBuilder();
        for (int i = 0; i < 6; i++) {
            int nibble = Character.digit(fingerprint.charAt((index * 6 + i) % fingerprint.length()), 16);
            tag.append((char) ('A' + (nibble + index * 7 + i) % 26));
        }
        return tag.toString();
    }
}
