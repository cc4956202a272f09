; copy input a to the lamp, forever
loop:   LD   a
        ST   lamp
        JMP  loop
