; every-op.asm -- uses every instruction of the pumpstation machine at least once.
;
; Inputs:  in_a, in_b (read; the others are not used)
; Outputs: pump  = in_a AND in_b        alarm = in_a XOR in_b
;          sum   = in_a + in_b + carry, bit 0   (full adder; carry kept in the carry bit)
;          ready = 1 after the first pass (set once, never cleared)
; Memory:  s0 = in_a AND NOT in_b (stored as in_a OR in_b, then cleared by R while in_b = 1)
;          s1 = NOT (in_a OR NOT in_b)    s2 = NOT (in_a AND NOT in_b)    s3 = NOT in_a
;          carry = carry out of the addition in the pass before.
; One pass of the loop recomputes everything from the inputs; it loops forever.

start:  NOP
        LD    in_a
        AND   in_b
        ST    pump          ; a & b
        LD    in_a
        XOR   in_b
        ST    alarm         ; a ^ b
        LD    in_a
        OR    in_b
        ST    s0            ; a | b ...
        LD    in_b
        R     s0            ; ... cleared while b = 1: a & !b
        LD    in_a
        ORN   in_b
        STN   s1            ; !(a | !b)
        LD    in_a
        ANDN  in_b
        STN   s2            ; !(a & !b)
        LDN   in_a
        ST    s3            ; !a
        LD    in_a
        ADD   in_b
        ST    sum           ; a ^ b ^ carry
        LDN   6             ; acc = 1 (address 6 reads 0)
        S     ready
        LD    6             ; acc = 0
        JMPC  start         ; acc = 0: not taken
        JMPCN again         ; taken
        NOP                 ; never runs
again:  JMP   start
