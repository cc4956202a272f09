; several kinds of error in one run
start:  LDD  low_sw
        ST   pump
start:  JMP  strat
        LD   20
        NOP  x y
