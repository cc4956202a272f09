; operands wider than their fields
        LD   16          ; sel is 4 bits
        JMP  0x100       ; operand is 8 bits
        ST   -1
        .word 0x1000     ; the word is 12 bits
