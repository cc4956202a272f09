; réglage
        LD low_sw
