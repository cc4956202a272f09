        LOAD low_sw
        STO pump
