"""Compares committed reference fixtures with freshly generated ones.

Usage: python3 compareFixtures.py COMMITTED_DIR FRESH_DIR

Non-JSON files must match byte for byte. JSON files must have the same structure, the same
strings and booleans, and numbers that agree to a relative 1e-10 (|a - b| <= 1e-10 * max(|a|, |b|),
or both below 1e-300). The reference libraries' last digits depend on the processor's BLAS
kernels and on summation order, so two machines can differ by a few units in the last place
(observed: relative differences up to about 1e-13); that is not drift. The tests that read the
fixtures use tolerances of 1e-9 and coarser. Exits 1 and lists every difference otherwise.
"""
import json
import math
import os
import sys

REL = 1e-10


def differences(a, b, path):
    if isinstance(a, bool) or isinstance(b, bool) or a is None or b is None:
        if a != b:
            yield f"{path}: {a!r} != {b!r}"
        return
    if isinstance(a, (int, float)) and isinstance(b, (int, float)):
        if math.isnan(a) and math.isnan(b):
            return
        scale = max(abs(a), abs(b))
        if scale < 1e-300 or abs(a - b) <= REL * scale:
            return
        yield f"{path}: {a!r} != {b!r}"
        return
    if isinstance(a, dict) and isinstance(b, dict):
        if a.keys() != b.keys():
            yield f"{path}: keys {sorted(a.keys() ^ b.keys())} differ"
            return
        for key in a:
            yield from differences(a[key], b[key], f"{path}.{key}")
        return
    if isinstance(a, list) and isinstance(b, list):
        if len(a) != len(b):
            yield f"{path}: length {len(a)} != {len(b)}"
            return
        for i, (x, y) in enumerate(zip(a, b)):
            yield from differences(x, y, f"{path}[{i}]")
        return
    if a != b:
        yield f"{path}: {a!r} != {b!r}"


def main(committed, fresh):
    problems = []
    names = sorted(set(os.listdir(committed)) | set(os.listdir(fresh)))
    for name in names:
        left, right = os.path.join(committed, name), os.path.join(fresh, name)
        if not os.path.exists(left) or not os.path.exists(right):
            problems.append(f"{name}: only in {'the fresh output' if os.path.exists(right) else 'the committed fixtures'}")
            continue
        if name.endswith(".json"):
            with open(left) as f:
                a = json.load(f)
            with open(right) as f:
                b = json.load(f)
            problems.extend(f"{name}{d}" for d in differences(a, b, ""))
        else:
            with open(left, "rb") as f:
                a = f.read()
            with open(right, "rb") as f:
                b = f.read()
            if a != b:
                problems.append(f"{name}: bytes differ")
    for p in problems[:200]:
        print(p)
    if len(problems) > 200:
        print(f"... and {len(problems) - 200} more")
    return 1 if problems else 0


if __name__ == "__main__":
    sys.exit(main(sys.argv[1], sys.argv[2]))
