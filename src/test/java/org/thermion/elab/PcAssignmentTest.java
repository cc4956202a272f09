package org.thermion.elab;

import org.junit.jupiter.api.Test;
import org.thermion.lang.Diagnostics;
import org.thermion.lang.Span;
import org.thermion.lang.ast.Ident;
import org.thermion.lang.ast.RtExpr;
import org.thermion.model.IsaField;
import org.thermion.model.Transfer;

import java.util.List;

import static org.assertj.core.api.Assertions.assertThat;

/** What an assignment to the program counter means: a jump, a skip, or a relative jump. */
class PcAssignmentTest {
    /** A 12-bit word: opcode 11..8, operand 7..0, and a 4-bit offset field 3..0. */
    private static final List<IsaField> FIELDS = List.of(new IsaField("opcode", 11, 8), new IsaField("operand", 7, 0),
            new IsaField("offset", 3, 0));

    private final Diagnostics diags = new Diagnostics();
    private final PcAssignment pc = new PcAssignment(FIELDS, diags);

    private static RtExpr ref(String name) {
        return new RtExpr.Ref(new Ident(name, Span.none()), Span.none());
    }

    private static RtExpr num(long v) {
        return new RtExpr.Num(v, Span.none());
    }

    private static RtExpr plus(RtExpr a, RtExpr b) {
        return new RtExpr.Bin(RtExpr.Op.PLUS, a, b, Span.none());
    }

    private static RtExpr minus(RtExpr a, RtExpr b) {
        return new RtExpr.Bin(RtExpr.Op.MINUS, a, b, Span.none());
    }

    @Test
    void aFieldIsAJump() {
        assertThat(pc.read(ref("operand"))).isEqualTo(new Transfer.ToPc(1));
        assertThat(diags.all()).isEmpty();
    }

    @Test
    void pcPlusTwoIsASkip() {
        assertThat(pc.read(plus(ref("pc"), num(2)))).isEqualTo(new Transfer.PcStep(2, -1, false));
    }

    @Test
    void pcMinusAFieldPlusOneIsARelativeJumpBackwards() {
        // pc - offset + 1, read left to right: ((pc - offset) + 1).
        Transfer t = pc.read(plus(minus(ref("pc"), ref("offset")), num(1)));
        assertThat(t).isEqualTo(new Transfer.PcStep(1, 2, true));
        // From address 10 with offset 3 in the word: 10 - 3 + 1 = 8.
        assertThat(((Transfer.PcStep) t).from(10, 0x003, FIELDS)).isEqualTo(8);
    }

    @Test
    void aSubtractedBracketFlipsTheSignsInside() {
        // pc - (offset - 2) = pc - offset + 2.
        assertThat(pc.read(minus(ref("pc"), minus(ref("offset"), num(2))))).isEqualTo(new Transfer.PcStep(2, 2, true));
    }

    @Test
    void numbersAddUp() {
        assertThat(pc.read(minus(plus(plus(ref("pc"), num(3)), num(4)), num(5)))).isEqualTo(new Transfer.PcStep(2, -1, false));
    }

    @Test
    void aLongChainCostsNoCallDepth() {
        RtExpr e = ref("pc");
        for (int i = 0; i < 100_000; i++) {
            e = plus(e, num(1));
        }
        assertThat(pc.read(e)).isEqualTo(new Transfer.PcStep(100_000, -1, false));
    }

    @Test
    void twoFieldsAreRefused() {
        assertThat(pc.read(plus(plus(ref("pc"), ref("offset")), ref("operand")))).isNull();
        assertThat(diags.all()).singleElement().satisfies(d -> {
            assertThat(d.message()).isEqualTo("a relative jump adds one field to pc, not two");
            assertThat(d.hint()).isEqualTo(PcAssignment.HOW);
        });
    }

    @Test
    void pcMustComeFirstAndUnsubtracted() {
        assertThat(pc.read(plus(num(2), ref("pc")))).isNull();
        assertThat(pc.read(minus(num(0), ref("pc")))).isNull();
        assertThat(diags.all()).extracting(d -> d.message())
                .containsOnly("a jump takes its target from a field, or adds to pc");
    }

    @Test
    void aNameThatIsNoFieldIsNeitherAJumpNorATerm() {
        assertThat(pc.read(ref("acc"))).isNull();
        assertThat(pc.read(plus(ref("pc"), ref("acc")))).isNull();
        assertThat(diags.all()).extracting(d -> d.message()).containsExactly(
                "a jump takes its target from a field; 'acc' is not one",
                "pc adds numbers and one field; this is neither");
    }
}
