        LD 0x1G
        ST 12ab
        JMP 0b102
