package org.thermion.tui;

import com.googlecode.lanterna.TextCharacter;
import com.googlecode.lanterna.TextColor;

import java.util.HashMap;
import java.util.IdentityHashMap;
import java.util.Map;

/**
 * Screen cells made once and reused: building a Lanterna character checks its Unicode
 * block and width each time, which at 25 frames a second cost more than the drawing itself.
 */
final class Cells {
    private final Map<TextColor, Integer> colorIds = new IdentityHashMap<>();
    private final Map<Long, TextCharacter> cells = new HashMap<>();

    TextCharacter of(char c, TextColor fg, TextColor bg) {
        long key = (long) c << 32 | (long) id(fg) << 16 | id(bg);
        TextCharacter t = cells.get(key);
        if (t == null) {
            t = new TextCharacter(c, fg, bg);
            cells.put(key, t);
        }
        return t;
    }

    private int id(TextColor color) {
        Integer id = colorIds.get(color);
        if (id == null) {
            id = colorIds.size();
            colorIds.put(color, id);
        }
        return id;
    }
}
