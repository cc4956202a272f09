; directives and names used wrongly
        .org 0x10
        .const LIMIT
pump:   NOP  3
        LD
        .const A = B + 1
        .const B = A * 2
        LD   A
