package org.thermion.fuzz;

import java.io.ByteArrayOutputStream;
import java.nio.charset.StandardCharsets;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.Random;

/**
 * Edits a file the way a careless or unlucky user might: bytes and lines deleted, doubled,
 * swapped or replaced, numbers made huge or odd, expressions nested deeply, the file cut off,
 * the encoding or the line endings changed.
 */
final class InputMutator {
    static final String ALPHABET = "{}()[]:=,.;-!#\"\\_+*/%&|^<> \t\n\rabcxyz019";
    static final List<String> NUMBERS = List.of("0", "1", "-1", "65536", "65537", "4294967296", "9223372036854775807",
            "9223372036854775808", "99999999999999999999999999", "0xFFFFFFFFFFFFFFFFFFFFFFFF", "0b", "0x", "1e400", "1e-400",
            "1e308", "NaN", "Infinity", "-0", "0.0000001", "1_000_000", "007", "1.5");

    private final Random rnd;

    InputMutator(Random rnd) {
        this.rnd = rnd;
    }

    byte[] mutate(byte[] original) {
        int kind = rnd.nextInt(10);
        return switch (kind) {
            case 0 -> truncate(original);
            case 1 -> encode(new String(original, StandardCharsets.UTF_8));
            case 2 -> utf8(nest(text(original)));
            case 3 -> utf8(numbers(text(original)));
            case 4 -> utf8(lines(text(original)));
            default -> bytes(original);
        };
    }

    private static String text(byte[] b) {
        return new String(b, StandardCharsets.UTF_8);
    }

    private static byte[] utf8(String s) {
        return s.getBytes(StandardCharsets.UTF_8);
    }

    private byte[] truncate(byte[] b) {
        return Arrays.copyOf(b, b.length == 0 ? 0 : rnd.nextInt(b.length));
    }

    /** Another encoding, a byte-order mark, a stray 8-bit or NUL byte, or other line endings. */
    private byte[] encode(String s) {
        switch (rnd.nextInt(6)) {
            case 0:
                return (s.replace("#", "# déjà ")).getBytes(StandardCharsets.ISO_8859_1);
            case 1:
                return s.getBytes(StandardCharsets.UTF_16);
            case 2:
                return utf8("\uFEFF" + s);
            case 3:
                return utf8(s.replace("\n", rnd.nextBoolean() ? "\r\n" : "\r"));
            default:
                byte[] b = utf8(s);
                ByteArrayOutputStream out = new ByteArrayOutputStream();
                int at = b.length == 0 ? 0 : rnd.nextInt(b.length);
                out.write(b, 0, at);
                out.write(rnd.nextBoolean() ? 0 : (0x80 + rnd.nextInt(0x80)));
                out.write(b, at, b.length - at);
                return out.toByteArray();
        }
    }

    /** Brackets or prefix operators, from a few to far past the documented limit, around a name or number. */
    private String nest(String s) {
        int depth = List.of(3, 50, 99, 100, 101, 300, 6000).get(rnd.nextInt(7));
        int at = randomWordStart(s);
        if (at < 0) {
            return s;
        }
        int end = at;
        while (end < s.length() && Character.isLetterOrDigit(s.charAt(end))) {
            end++;
        }
        String open = List.of("(", "!", "-", "{", "[").get(rnd.nextInt(5));
        String close = switch (open) {
            case "(" -> ")";
            case "{" -> "}";
            case "[" -> "]";
            default -> "";
        };
        return s.substring(0, at) + open.repeat(depth) + s.substring(at, end) + close.repeat(depth) + s.substring(end);
    }

    private String numbers(String s) {
        StringBuilder b = new StringBuilder(s);
        for (int k = 0; k < 1 + rnd.nextInt(3); k++) {
            int at = -1;
            for (int tries = 0; tries < 20 && at < 0; tries++) {
                int p = rnd.nextInt(Math.max(1, b.length()));
                if (p < b.length() && Character.isDigit(b.charAt(p)) && (p == 0 || !Character.isLetterOrDigit(b.charAt(p - 1)))) {
                    at = p;
                }
            }
            if (at < 0) {
                break;
            }
            int end = at;
            while (end < b.length() && (Character.isLetterOrDigit(b.charAt(end)) || b.charAt(end) == '.' || b.charAt(end) == '_')) {
                end++;
            }
            b.replace(at, end, NUMBERS.get(rnd.nextInt(NUMBERS.size())));
        }
        return b.toString();
    }

    private String lines(String s) {
        List<String> l = new ArrayList<>(Arrays.asList(s.split("\n", -1)));
        if (l.isEmpty()) {
            return s;
        }
        for (int k = 0; k < 1 + rnd.nextInt(4); k++) {
            int i = rnd.nextInt(l.size());
            switch (rnd.nextInt(4)) {
                case 0 -> l.remove(i);
                case 1 -> l.add(i, l.get(i));
                case 2 -> java.util.Collections.swap(l, i, rnd.nextInt(l.size()));
                default -> l.set(i, l.get(i).repeat(1 + rnd.nextInt(50)));
            }
            if (l.isEmpty()) {
                return "";
            }
        }
        return String.join("\n", l);
    }

    private byte[] bytes(byte[] original) {
        StringBuilder b = new StringBuilder(text(original));
        for (int e = 0; e < 1 + rnd.nextInt(5) && b.length() > 0; e++) {
            int at = rnd.nextInt(b.length());
            switch (rnd.nextInt(4)) {
                case 0 -> b.deleteCharAt(at);
                case 1 -> b.insert(at, b.charAt(at));
                case 2 -> b.setCharAt(at, ALPHABET.charAt(rnd.nextInt(ALPHABET.length())));
                default -> {
                    int len = Math.min(b.length() - at, 1 + rnd.nextInt(40));
                    b.delete(at, at + len);
                }
            }
        }
        return utf8(b.toString());
    }

    private int randomWordStart(String s) {
        for (int tries = 0; tries < 50 && !s.isEmpty(); tries++) {
            int p = rnd.nextInt(s.length());
            if (Character.isLetterOrDigit(s.charAt(p)) && (p == 0 || !Character.isLetterOrDigit(s.charAt(p - 1)))) {
                int lineStart = s.lastIndexOf('\n', p) + 1;
                int hash = s.indexOf('#', lineStart);
                if (hash < 0 || hash > p) {
                    return p;
                }
            }
        }
        return -1;
    }
}
