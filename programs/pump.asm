; pump.asm -- fill and drain control of a water tower, for the pumpstation machine.
;
; Inputs (1 = switch wet / pressed):
;   low_sw   level switch near the bottom of the tank: 1 while water covers it
;   high_sw  level switch near the top of the tank:    1 while water covers it
;   manual   hand switch: 1 forces the pump on
; Outputs:
;   pump     1 runs the pump (through the pump contactor relay)
;   alarm    1 lights the alarm lamp
; Memory: s0 holds the automatic run request between passes.
;
; Rule, evaluated once per pass of the loop (10 instructions, 10 machine cycles):
;   run   := !high_sw & (!low_sw | run)   start when low_sw is dry, run until high_sw is wet;
;                                         high wet stops the automatic run even while low is dry
;   pump  := run | manual
;   alarm := high_sw & !low_sw            the switches disagree: high wet while low dry
; After reset run = 0. Each pass reads the inputs afresh; an output changes at most once a pass.

.const run = s0             ; automatic run request

loop:   LDN  low_sw         ; acc = low switch dry
        OR   run            ;     | already running
        ANDN high_sw        ;     & high switch still dry
        ST   run
        OR   manual         ; the hand switch overrides
        ST   pump
        LD   high_sw        ; alarm: high wet while low dry
        ANDN low_sw
        ST   alarm
        JMP  loop
