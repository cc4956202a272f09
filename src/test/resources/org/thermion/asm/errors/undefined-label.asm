; a jump to a label that is not there
loop:   LD   low_sw
        JMPC lop
        JMP  nowhere
