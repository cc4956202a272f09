.const big = 0x3FFFFFFFFFFFFFFF
        LD big * big
        ST 5 / 0
