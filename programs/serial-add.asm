; serial-add.asm -- adds two 4-bit numbers presented bit-serially, for the pumpstation machine.
;
; Inputs:  in_a, in_b  one bit of each number;  strobe  the presenter's handshake line
; Outputs: sum         one bit of the sum;      ready   the machine's handshake line
; Memory:  carry       the carry between bit positions
;          s0..s3      how many bits of the current addition were taken (s0, then s0 s1, ...:
;                      after k data bits s0..s(k-1) are 1)
;
; One addition is five strobe pulses. Pulses 1..4 carry bit 0..3 of A on in_a and of B on in_b
; (least significant bit first); pulse 5 carries no data (in_a, in_b are ignored). The machine
; answers each pulse with one bit of the 5-bit sum A + B on `sum`, least significant first;
; the answer to pulse 5 is the carry out of bit 3. Then carry and s0..s3 are 0 again and the
; next addition begins with the next pulse.
;
; Handshake for every pulse (four phases; neither side ever waits on a change it made itself):
;   1. The machine sets ready = 1: it waits for a bit. (After reset ready is 0 until then.)
;   2. The presenter, seeing ready = 1, drives in_a and in_b and sets strobe = 1 (in the same
;      cycle or later); it holds in_a and in_b until step 3.
;   3. The machine, seeing strobe = 1, takes the bits, writes `sum`, then sets ready = 0.
;      `sum` is valid from the moment ready falls until the machine next writes it (step 3 of
;      the next pulse).
;   4. The presenter, seeing ready = 0, reads `sum` and sets strobe = 0. The machine, seeing
;      strobe = 0, goes back to step 1.

.const ZERO = 6             ; an address nothing is mapped at: reads 0

idle:   LDN  ZERO           ; acc = 1
        ST   ready          ; 1. waiting for a bit
wait1:  LD   strobe
        JMPCN wait1         ; 3. until strobe = 1
        LD   s3
        JMPC last           ; four data bits already taken: this is pulse 5
        LD   in_a
        ADD  in_b           ; acc = a ^ b ^ carry, carry = majority(a, b, carry)
        ST   sum
        LD   s2             ; count the bit: shift a 1 into s0..s3
        ST   s3
        LD   s1
        ST   s2
        LD   s0
        ST   s1
        LDN  ZERO
        ST   s0
        JMP  done
last:   R    s0             ; acc = 1 here (s3 was 1): clear the count
        R    s1
        R    s2
        R    s3
        LD   ZERO           ; acc = 0
        ADD  ZERO           ; acc = carry, carry = 0
        ST   sum            ; bit 4 of the sum
done:   LD   ZERO
        ST   ready          ; sum is valid: ready falls
wait0:  LD   strobe
        JMPC wait0          ; until strobe = 0
        JMP  idle
