"""Cross-checks the pinball-loss fixture with a general-purpose library: scikit-learn's
sklearn.metrics.mean_pinball_loss (Debian package python3-sklearn), on the actuals and
quantile forecasts that panel_pinball.R wrote (R datasets Nile and LakeHuron).
Writes fixtures/panel_pinball_sklearn.json. Usage: python3 panel_pinball_sklearn.py OUTDIR
"""
import json
import os
import sys

import sklearn
from sklearn.metrics import mean_pinball_loss

out = sys.argv[1]
with open(os.path.join(out, "panel_pinball.json")) as f:
    source = json.load(f)

cases = []
for case in source["cases"]:
    levels = []
    for q in case["quantiles"]:
        levels.append({
            "level": q["level"],
            "meanLoss": float(mean_pinball_loss(case["actual"], q["values"], alpha=q["level"])),
        })
    cases.append({"name": case["name"], "levels": levels})

result = {
    "generator": "test/reference/scripts/panel_pinball_sklearn.py",
    "source": f"scikit-learn {sklearn.__version__}: sklearn.metrics.mean_pinball_loss(y, q, alpha=level) on the inputs of panel_pinball.json",
    "cases": cases,
}
with open(os.path.join(out, "panel_pinball_sklearn.json"), "w") as f:
    json.dump(result, f, indent=2)
    f.write("\n")
