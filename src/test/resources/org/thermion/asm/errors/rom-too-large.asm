; more words than the 256-word ROM holds
        .at  254
        LD   low_sw
        ST   pump
        JMP  0
        JMP  0
