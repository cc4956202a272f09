package org.thermion.build;

import java.util.List;

/**
 * The machine as a builder wires it: every part with its designator, every node with the leads
 * it joins, every socket pin by pin, and what could not be wired (findings for the checks).
 */
public record Wiring(List<String> boards, List<Part> parts, List<Node> nodes, List<Socket> sockets,
                     List<String> problems, List<Placement> placements) {
    public Wiring {
        boards = List.copyOf(boards);
        parts = List.copyOf(parts);
        nodes = List.copyOf(nodes);
        sockets = List.copyOf(sockets);
        problems = List.copyOf(problems);
        placements = List.copyOf(placements);
    }

    /** A wiring that records no stage placements (documents that never compare revisions). */
    public Wiring(List<String> boards, List<Part> parts, List<Node> nodes, List<Socket> sockets, List<String> problems) {
        this(boards, parts, nodes, sockets, problems, List.of());
    }

    /** Where one stage instance sits: its name and its tube sections, "V3.2" (tube designator, section). */
    public record Placement(String stage, List<String> sections) {
        public Placement {
            sections = List.copyOf(sections);
        }
    }

    /**
     * One tube socket: the envelope it holds, its designators, tube type and base, and per pin
     * (index = pin - 1) what the basing puts there, the node it is wired to (-1: none) and whether
     * that pin depends on a basing doubt.
     */
    public record Socket(int envelope, String ref, String tubeRef, String tube, String base, int board,
                         List<String> electrodes, int[] nodes, boolean[] doubtful) {
        public Socket {
            electrodes = List.copyOf(electrodes);
            nodes = nodes.clone();
            doubtful = doubtful.clone();
        }

        /** The node of pin {@code pin} (1-based), -1 for none. */
        public int node(int pin) {
            return nodes[pin - 1];
        }

        public boolean doubtful(int pin) {
            return doubtful[pin - 1];
        }

        public int pins() {
            return nodes.length;
        }
    }
}
