package org.thermion.cli;

import org.junit.jupiter.api.Test;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;

import static org.assertj.core.api.Assertions.assertThat;

/** {@code sheets wires}: every net's leads grouped by board, the board named in the data. */
class SheetsWiresTest {

    @Test
    void eachNetsLeadsComeBoardByBoardAndCarryTheirBoard() {
        TimingCommandTest.Run r = TimingCommandTest.run("sheets", "wires", "examples/pumpstation/pumpstation.machine",
                "--format", "csv");
        assertThat(r.code()).isEqualTo(ExitCodes.OK);
        // CSV rows of the leads table: leads,node,kind,board,part,pin,what,doubtful
        Map<String, List<String>> boardsOfNet = new LinkedHashMap<>();
        int crossing = 0;
        for (String line : r.out().split("\n")) {
            if (line.startsWith("leads,") && !line.startsWith("leads,node,")) {
                String[] f = line.split(",");
                String part = f[f.length - 4];
                String board = f[f.length - 5];
                String node = f[1];
                List<String> seen = boardsOfNet.computeIfAbsent(node, k -> new ArrayList<>());
                if (seen.isEmpty() || !seen.get(seen.size() - 1).equals(board)) {
                    // a board met again after another would mean the net's leads are not grouped
                    assertThat(seen).as(node).doesNotContain(board);
                    seen.add(board);
                }
                // the designator's A prefix and the board agree: boards are numbered A1, A2, ... in order
                assertThat(part).as(node).startsWith("A");
            }
        }
        for (List<String> b : boardsOfNet.values()) {
            crossing += b.size() > 1 ? 1 : 0;
        }
        assertThat(crossing).as("nets that cross boards").isGreaterThan(10);
    }
}
