"""Reference outputs of MT19937 from NumPy (an independent, general-purpose implementation).

NumPy's MT19937 bit generator with `_legacy_seeding(seed)` uses Matsumoto & Nishimura's `init_genrand`
for an integer seed; `random_raw` returns the tempered 32-bit outputs; `RandomState(seed).random_sample()`
is `genrand_res53`. Run: python3 mt19937-numpy.py > mt19937-numpy.json  (NumPy 2.4.6 was used).
"""
import json

import numpy as np

out = {"numpy": np.__version__, "raw": {}, "res53": {}}
for seed in (0, 1, 42, 5489, 4294967295):
    bg = np.random.MT19937(0)
    bg._legacy_seeding(seed)
    raw = bg.random_raw(1300)  # more than two twists of the 624-word state
    out["raw"][str(seed)] = {"first": [int(x) for x in raw[:8]], "at1299": int(raw[1299])}
    rs = np.random.RandomState(seed)
    out["res53"][str(seed)] = [float(x) for x in rs.random_sample(6)]
print(json.dumps(out, indent=1))
