; lines the grammar cannot read
        LD   (1 +
loop    LD   low_sw
        ST   pump, alarm
        JMP  @
        LD   0x
