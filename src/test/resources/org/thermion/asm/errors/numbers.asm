; numbers the reader cannot read
        LD   0x
        LD   0b102
        LD   12ab
        JMP  0x1_0
