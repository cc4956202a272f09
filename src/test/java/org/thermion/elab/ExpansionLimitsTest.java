package org.thermion.elab;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.Timeout;
import org.thermion.lang.Diagnostic;
import org.thermion.lang.Diagnostics;
import org.thermion.model.Machine;

import java.util.concurrent.TimeUnit;
import java.util.concurrent.atomic.AtomicReference;

import static org.assertj.core.api.Assertions.assertThat;

/** Bad sizes and shapes end in an error at the place that asks for them, never in a crash. */
class ExpansionLimitsTest {

    private static Diagnostics elaborate(String body) {
        Diagnostics d = new Diagnostics();
        Machine m = ElaborationTest.elaborate(body, d);
        assertThat(m).isNull();
        assertThat(d.hasErrors()).isTrue();
        return d;
    }

    private static Diagnostic first(Diagnostics d) {
        return d.all().get(0);
    }

    /** Module m0 uses m1, which uses m2, ... down to a leaf; {@code depth} modules in all. */
    private static String chain(int depth) {
        StringBuilder sb = new StringBuilder();
        for (int i = 0; i < depth - 1; i++) {
            sb.append("module m").append(i).append(" { in a; out y; use m").append(i + 1).append(" as u (a: a, y: y) }\n");
        }
        sb.append("module m").append(depth - 1).append(" { in a; out y; y = !a }\n");
        sb.append("machine t { top m0; inputs a; outputs y }\n");
        return sb.toString();
    }

    @Test
    void instancesNestedAThousandDeepAreAnErrorAtTheUseThatGoesTooDeep() {
        Diagnostics d = elaborate(chain(1000));
        Diagnostic e = first(d);
        assertThat(e.message()).isEqualTo("this module instance would nest 101 deep; module instances and generator loops"
                + " nest at most 100 deep, together");
        // m0 is the top (depth 0); the use in module m99 would open level 101.
        assertThat(e.span().line()).isEqualTo(LoopUnroller.MAX_NESTING + 1 + countLines(ElaborationTest.PARTS));
        assertThat(d.errorCount()).isEqualTo(1);
    }

    @Test
    void loopsCountTowardsTheSameNesting() {
        // Each module places the next inside a loop: two levels per module.
        StringBuilder sb = new StringBuilder();
        for (int i = 0; i < 80; i++) {
            sb.append("module m").append(i).append(" { in a; out y; for k in 0..0 { use m").append(i + 1)
                    .append(" as u (a: a, y: y) } }\n");
        }
        sb.append("module m80 { in a; out y; y = a }\nmachine t { top m0; inputs a; outputs y }\n");
        Diagnostic e = first(elaborate(sb.toString()));
        assertThat(e.message()).startsWith("this generator loop would nest 101 deep");
        // The loop of m50: levels 2 x 50 + 1.
        assertThat(e.span().line()).isEqualTo(countLines(ElaborationTest.PARTS) + 51);
    }

    @Test
    void aChainJustWithinTheLimitElaborates() {
        Diagnostics d = new Diagnostics();
        Machine m = ElaborationTest.elaborate(chain(LoopUnroller.MAX_NESTING + 1), d);
        assertThat(d.hasErrors()).as(d.all().toString()).isFalse();
        assertThat(m.modules()).hasSize(LoopUnroller.MAX_NESTING + 1);
    }

    @Test
    void aChildPortABillionBitsWideIsRefusedAtItsDeclarationWithTheLimit() {
        Diagnostics d = elaborate("""
                module wide { in a[1000000000]; out y; y = a[0] }
                module top { in a; out y; use wide as w (a: a, y: y) }
                machine t { top top; inputs a; outputs y }
                """);
        Diagnostic e = first(d);
        assertThat(e.message()).isEqualTo("bus width 1000000000 of port 'a' is out of range");
        assertThat(e.hint()).isEqualTo("use a width from 1 to 65536");
        assertThat(e.span().col()).isEqualTo("module wide { in a[".length() + 1);
    }

    @Test
    void aConcatenationWiderThanAnyBusIsRefusedBeforeItIsBuilt() {
        Diagnostics d = elaborate("module top { in a[65536]; out y[65536]; y = {" + "a, ".repeat(999) + "a} }\n"
                + "machine t { top top; inputs a; outputs y }\n");
        assertThat(first(d).message()).isEqualTo("concatenation is wider than 65536 bits");
    }

    @Test
    void isaFieldsFitTheWordWhetherTheWordComesBeforeOrAfterThem() {
        String machine = """
                module top { in a; out y; latch y on phase 1 = a }
                machine t { clock { phases 1; period 1 ms }; top top; inputs a; outputs y }
                """;
        Diagnostics late = elaborate(machine + """
                isa t {
                  field opcode 7..2
                  field operand 1..0
                  word 4
                  opcode opcode
                  state y = y
                  op SET 1 { y <- 1 }
                }
                """);
        assertThat(first(late).message()).isEqualTo("field 'opcode' bits 7..2 do not fit a 4-bit word");
        Diagnostics huge = elaborate(machine + """
                isa t {
                  field opcode 99999999999..2
                  word 4
                  opcode opcode
                  state y = y
                  op SET 1 { y <- 1 }
                }
                """);
        assertThat(first(huge).message()).contains("out of range").contains("99999999999");
    }

    @Test
    void constantArithmeticThatOverflowsIsAnErrorNotAWrappedWidth() {
        Diagnostics d = elaborate("""
                module top {
                  const big = 4611686018427387904 * 4
                  in a
                  out y[big]
                  y[0] = a
                }
                machine t { top top; inputs a; outputs y }
                """);
        assertThat(first(d).message()).isEqualTo("constant arithmetic overflows 64 bits");
    }

    @Test
    void aLoopOverTheWholeLongRangeIsRefusedWithoutWrappingItsCount() {
        Diagnostics d = elaborate("""
                module top {
                  in a
                  out y
                  for i in -9223372036854775807..9223372036854775807 { y = a }
                }
                machine t { top top; inputs a; outputs y }
                """);
        assertThat(first(d).message()).isEqualTo("generator would expand more than 1,000,000 times (limit 1,000,000)");
    }

    @Test
    void constantsMayBeWrittenInAnyOrderAndACycleIsNamed() {
        Diagnostics ok = new Diagnostics();
        Machine m = ElaborationTest.elaborate("""
                module top {
                  const w = half * 2
                  const half = 2
                  in a[w]
                  out y
                  y = a[w - 1]
                }
                machine t { top top; inputs a; outputs y }
                """, ok);
        assertThat(ok.hasErrors()).as(ok.all().toString()).isFalse();
        assertThat(m.inputs()).hasSize(4);
        Diagnostics d = elaborate("""
                module top {
                  const p = q + 1
                  const q = p + 1
                  in a
                  out y
                  y = a
                }
                machine t { top top; inputs a; outputs y }
                """);
        assertThat(first(d).message()).startsWith("constant '").contains("depends on itself");
    }

    @Test
    void aLongChainOfConstantsIsEvaluatedWithoutTheJvmStack() {
        StringBuilder sb = new StringBuilder("module top {\n  in a\n  out y[c19999]\n  y[0] = a\n");
        // Written last to first, so every constant names one not yet seen.
        for (int i = 19999; i > 0; i--) {
            sb.append("  const c").append(i).append(" = c").append(i - 1).append(" + 0\n");
        }
        sb.append("  const c0 = 1\n}\nmachine t { top top; inputs a; outputs y }\n");
        Diagnostics d = new Diagnostics();
        Machine m = ElaborationTest.elaborate(sb.toString(), d);
        assertThat(d.hasErrors()).as(d.all().toString()).isFalse();
        assertThat(m.outputs()).hasSize(1);
    }

    @Test
    @Timeout(value = 60, unit = TimeUnit.SECONDS)
    void anInterruptedThreadStopsALongElaborationWithAnError() throws InterruptedException {
        // 10^6 loop steps that make nothing new: long enough to be caught while running.
        String body = """
                module top {
                  in a
                  out y
                  y = a
                  for i in 0..999 { for j in 0..999 { } }
                }
                machine t { top top; inputs a; outputs y }
                """;
        AtomicReference<Diagnostics> result = new AtomicReference<>();
        AtomicReference<Boolean> flag = new AtomicReference<>();
        Thread t = new Thread(() -> {
            Thread.currentThread().interrupt();
            Diagnostics d = new Diagnostics();
            ElaborationTest.elaborate(body, d);
            result.set(d);
            flag.set(Thread.currentThread().isInterrupted());
        });
        t.start();
        t.join();
        assertThat(result.get().all()).extracting(Diagnostic::message).contains("elaboration stopped: interrupted");
        assertThat(flag.get()).as("the interrupt is kept for the caller").isTrue();
    }

    private static int countLines(String s) {
        return (int) s.chars().filter(c -> c == '\n').count();
    }
}
