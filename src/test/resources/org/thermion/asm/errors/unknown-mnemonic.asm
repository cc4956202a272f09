; a misspelt mnemonic
loop:   LDX  low_sw
        STOR pump
        JMP  loop
