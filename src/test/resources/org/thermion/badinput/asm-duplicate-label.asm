loop:   LD low_sw
loop:   ST pump
        JMP loop
