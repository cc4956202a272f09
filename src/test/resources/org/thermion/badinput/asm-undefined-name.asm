loop:   LD lowsw
        JMP lop
