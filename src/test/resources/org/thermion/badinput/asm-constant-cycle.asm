.const a = b + 1
.const b = a + 1
        LD a
