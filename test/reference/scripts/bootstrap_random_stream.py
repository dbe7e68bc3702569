"""Golden values for skillgate's random source, from an independent implementation of the
published algorithms in plain Python integers (no library generator):

- SplitMix64 (Steele, Lea & Flood 2014; constants of Vigna's reference splitmix64.c) fills the
  128-bit state (s0, s1) from the seed;
- xoroshiro128+ (Blackman & Vigna 2021, parameters a=24, b=16, c=37) and its jump function
  (JUMP = 0xdf900294d8f554a5, 0x170865df4b3201fc, equivalent to 2^64 steps);
- every 64-bit output gives two nextUint32 words, its high 32 bits first, then its low 32 bits;
  nextDouble = ((a >> 5) * 2^26 + (b >> 6)) / 2^53 from two consecutive words a, b.

Usage: python3 bootstrap_random_stream.py OUTDIR  -> OUTDIR/bootstrap_random_stream.json
"""
import json
import os
import sys

MASK = (1 << 64) - 1


def splitmix64(seed, count):
    state = seed & MASK
    out = []
    for _ in range(count):
        state = (state + 0x9E3779B97F4A7C15) & MASK
        z = state
        z = ((z ^ (z >> 30)) * 0xBF58476D1CE4E5B9) & MASK
        z = ((z ^ (z >> 27)) * 0x94D049BB133111EB) & MASK
        out.append(z ^ (z >> 31))
    return out


def rotl(x, k):
    return ((x << k) | (x >> (64 - k))) & MASK


class Xoroshiro128Plus:
    def __init__(self, s0, s1):
        self.s0, self.s1 = s0, s1

    def next64(self):
        s0, s1 = self.s0, self.s1
        result = (s0 + s1) & MASK
        s1 ^= s0
        self.s0 = rotl(s0, 24) ^ s1 ^ ((s1 << 16) & MASK)
        self.s1 = rotl(s1, 37)
        return result

    def jump(self):
        t0 = t1 = 0
        for word in (0xDF900294D8F554A5, 0x170865DF4B3201FC):
            for bit in range(64):
                if word & (1 << bit):
                    t0 ^= self.s0
                    t1 ^= self.s1
                self.next64()
        self.s0, self.s1 = t0, t1


def source(seed, stream):
    s0, s1 = splitmix64(seed, 2)
    gen = Xoroshiro128Plus(s0, s1)
    for _ in range(stream):
        gen.jump()
    return gen


def main():
    outdir = sys.argv[1]
    cases = []
    for seed in (0, 1, 42, 20240601, 2**53 - 1):
        for stream in (0, 1, 3):
            gen = source(seed, stream)
            words = []
            for _ in range(9):
                x = gen.next64()
                words += [x >> 32, x & 0xFFFFFFFF]
            # 9 words for nextUint32 (an odd count, so the doubles start mid-output), then
            # 4 doubles from the next 8 words.
            uint32 = words[:9]
            doubles = []
            for i in range(4):
                a = words[9 + 2 * i]
                b = words[10 + 2 * i]
                doubles.append(((a >> 5) * 67108864 + (b >> 6)) / 9007199254740992.0)
            cases.append({"seed": seed, "stream": stream, "uint32": uint32,
                          "doubles": [repr(x) for x in doubles]})
    doc = {
        "source": "test/reference/scripts/bootstrap_random_stream.py: SplitMix64 seeding + "
                  "xoroshiro128+ (Blackman & Vigna 2021) with jump, plain Python integers",
        "note": "doubles are repr() strings so every digit survives; first 9 nextUint32 then 4 nextDouble",
        "cases": cases,
    }
    with open(os.path.join(outdir, "bootstrap_random_stream.json"), "w") as f:
        json.dump(doc, f, indent=1, sort_keys=True)
        f.write("\n")


if __name__ == "__main__":
    main()
