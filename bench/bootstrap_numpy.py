"""One timed bootstrap case with numpy, run by bench/run.mjs:
    python3 bootstrap_numpy.py <series.f64> <block_length> <resamples> <seed>
The stationary bootstrap written the vectorised numpy way: per resample, draw a new-block coin
and a start for every observation, turn them into the resample's index vector with cumsum and
fancy indexing, and average d at those indices. Prints one JSON line with the wall and CPU
milliseconds (process time: on a shared machine the fairer of the two).
"""
import json
import sys
import time

import numpy as np


def main() -> None:
    path, block_text, resamples_text, seed_text = sys.argv[1:5]
    d = np.fromfile(path, dtype="<f8")
    n = d.size
    p = 1.0 / float(block_text)
    resamples = int(resamples_text)
    rng = np.random.default_rng(int(seed_text))
    positions = np.arange(n)
    t0 = time.perf_counter()
    c0 = time.process_time()
    means = np.empty(resamples)
    for b in range(resamples):
        new_block = rng.random(n) < p
        new_block[0] = True
        starts = rng.integers(0, n, size=n)
        block_first = np.flatnonzero(new_block)
        block_of = np.cumsum(new_block) - 1
        offset = positions - block_first[block_of]
        index = (starts[block_first][block_of] + offset) % n
        means[b] = d[index].mean()
    wall = (time.perf_counter() - t0) * 1000
    cpu = (time.process_time() - c0) * 1000
    print(json.dumps({"wall": wall, "cpu": cpu, "checksum": float(np.std(means - d.mean()))}))


main()
