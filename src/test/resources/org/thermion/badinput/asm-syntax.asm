start:  LD low_sw
        ST pump extra
        JMP start )
        OR ( s0
