package org.thermion.spice;

/** Node and part names a SPICE3 reader accepts: letters, digits and underscores; ground is "0". */
public final class SpiceNames {
    private SpiceNames() {
    }

    /** {@code text} with every other character turned into '_' (and "_" for empty text). */
    public static String clean(String text) {
        StringBuilder sb = new StringBuilder(text.length());
        for (int i = 0; i < text.length(); i++) {
            char c = text.charAt(i);
            sb.append(c < 128 && Character.isLetterOrDigit(c) ? c : '_');
        }
        return sb.length() == 0 ? "_" : sb.toString();
    }
}
