; the same label twice
loop:   LD   low_sw
loop:   ST   pump
        JMP  loop
