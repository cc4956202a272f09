package org.thermion.lang;

import java.io.IOException;
import java.nio.ByteBuffer;
import java.nio.CharBuffer;
import java.nio.charset.CharsetDecoder;
import java.nio.charset.CoderResult;
import java.nio.charset.CodingErrorAction;
import java.nio.charset.StandardCharsets;
import java.nio.file.AccessDeniedException;
import java.nio.file.Files;
import java.nio.file.NoSuchFileException;
import java.nio.file.Path;

/**
 * Turns a file's bytes into text. Every input file is UTF-8; a file that is not gets one
 * error at the line and column of its first bad byte, naming the byte, instead of a vague
 * "cannot read" (or, for an include, "not found").
 */
public final class SourceText {
    private SourceText() {
    }

    /**
     * The text of {@code file}, or null after reporting why it cannot be read: "cannot read
     * {@code what} FILE: reason" without a line, or the first byte that is not UTF-8.
     */
    public static String read(Path file, String what, SourceSet sources, Diagnostics diags) {
        if (file.toString().isEmpty()) {
            diags.error(Span.none(), "cannot read the " + what + ": no file name given", null);
            return null;
        }
        byte[] bytes;
        try {
            bytes = Files.readAllBytes(file);
        } catch (IOException e) {
            diags.error(new Span(file, 0, 0, 0, 0), "cannot read " + what + " " + file + ": " + reason(file, e));
            return null;
        }
        String text = decode(file, bytes, sources, diags);
        if (text != null) {
            sources.put(file, text);
        }
        return text;
    }

    /** Why {@code file} could not be read, in a few words. */
    public static String reason(Path file, IOException e) {
        if (Files.isDirectory(file)) {
            return "it is a directory";
        }
        if (e instanceof NoSuchFileException) {
            return "no such file";
        }
        if (e instanceof AccessDeniedException) {
            return "permission denied";
        }
        return e.getMessage() == null ? e.getClass().getSimpleName() : e.getMessage();
    }

    /**
     * The text of {@code bytes} read from {@code file}, or null after reporting the first
     * byte that is not UTF-8. The text (bad bytes replaced) is kept in {@code sources} so
     * the message can quote the line.
     */
    public static String decode(Path file, byte[] bytes, SourceSet sources, Diagnostics diags) {
        if (bytes.length >= 2 && ((bytes[0] & 0xFF) == 0xFF && (bytes[1] & 0xFF) == 0xFE
                || (bytes[0] & 0xFF) == 0xFE && (bytes[1] & 0xFF) == 0xFF)) {
            diags.error(new Span(file, 1, 1, 1, 2), "the file is UTF-16 text (it begins with the byte-order mark "
                    + String.format("%02X %02X", bytes[0] & 0xFF, bytes[1] & 0xFF) + "), not UTF-8",
                    "save the file as UTF-8");
            return null;
        }
        CharsetDecoder strict = StandardCharsets.UTF_8.newDecoder()
                .onMalformedInput(CodingErrorAction.REPORT).onUnmappableCharacter(CodingErrorAction.REPORT);
        ByteBuffer in = ByteBuffer.wrap(bytes);
        CharBuffer out = CharBuffer.allocate(bytes.length + 1);
        CoderResult r = strict.decode(in, out, true);
        if (!r.isError()) {
            strict.flush(out);
            return out.flip().toString();
        }
        int at = in.position();
        int line = 1;
        int lineStart = 0;
        for (int i = 0; i < at; i++) {
            if (bytes[i] == '\n') {
                line++;
                lineStart = i + 1;
            }
        }
        String before = new String(bytes, lineStart, at - lineStart, StandardCharsets.UTF_8);
        int col = before.codePointCount(0, before.length()) + 1;
        sources.put(file, new String(bytes, StandardCharsets.UTF_8));
        diags.error(new Span(file, line, col, line, col + 1),
                String.format("not valid UTF-8: byte 0x%02X at line %d, byte %d of the line (byte %d of the file)",
                        bytes[at] & 0xFF, line, at - lineStart + 1, at + 1),
                "save the file as UTF-8 (the text may be in Latin-1 or another 8-bit encoding)");
        return null;
    }
}
