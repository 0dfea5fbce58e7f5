#!/usr/bin/env python3
"""Compare a lot that behaved with a lot that flocculated, using only
Python's standard library: which difference of input carries the loss of
stability? Usage: python3 examples/compare.py [BASE_URL]"""
import json
import sys
import urllib.error
import urllib.request

BASE = sys.argv[1] if len(sys.argv) > 1 else "http://127.0.0.1:8080"

# Lot 41 was fine; lot 42 was made with water from a new, hard supply and
# drifted a little in size, zeta potential and pH.
LOT_41 = {
    "sample_id": "LOT-41",
    "particles": {"material": "zirconia", "diameter_nm": 400, "volume_fraction": 0.35, "zeta_mV": -42},
    "medium": {"liquid": "water", "temperature_c": 25, "ph": 9.2,
               "electrolytes": [{"formula": "NaCl", "concentration_mM": 2}]},
    "storage": {"container_height_mm": 600, "shelf_life_days": 7},
}
LOT_42 = {
    "sample_id": "LOT-42",
    "symptom": "flocculation",
    "particles": {"material": "zirconia", "diameter_nm": 420, "volume_fraction": 0.35, "zeta_mV": -40},
    "medium": {"liquid": "water", "temperature_c": 25, "ph": 9.0,
               "electrolytes": [{"formula": "NaCl", "concentration_mM": 2}],
               "hardness": {"value": 200, "unit": "mg_L_CaCO3"}},
    "storage": {"container_height_mm": 600, "shelf_life_days": 7},
    "analysis": {"draws": 100},
}


def post(path, body):
    req = urllib.request.Request(BASE + path, data=json.dumps(body).encode(), method="POST",
                                 headers={"Content-Type": "application/json"})
    try:
        with urllib.request.urlopen(req, timeout=30) as resp:
            return resp.status, json.load(resp)
    except urllib.error.HTTPError as err:  # 4xx: a problem detail
        return err.code, json.load(err)


def main():
    status, cmp = post("/v1/compare", {"reference": LOT_41, "complaint": LOT_42})
    assert status == 200, cmp
    print(cmp["verdict"])
    print(f"key scale: {cmp['key_scale']}")
    for d in cmp["differences"]:
        share = d.get("share")
        share = "n/a" if share is None else f"{100 * share:.0f} %"
        print(f"  {d['rank']}. {d['path']}: {json.dumps(d['reference'])} -> {json.dumps(d['complaint'])}  share {share}")
    for p in cmp["pairs"][:3]:
        print(f"  pair {p['paths'][0]} + {p['paths'][1]}: interaction {p['interaction'].get(cmp['key_scale'])}")
    print(f"complaint's top cause: {cmp['triage']['causes'][0]['id']}")
    assert cmp["differences"][0]["path"] == "/medium/hardness"

    bad = dict(LOT_41, particles=dict(LOT_41["particles"], volume_fraction=0.9))
    status, problem = post("/v1/compare", {"reference": bad, "complaint": LOT_42})
    assert status == 422, problem
    print("rejected:", ", ".join(e["pointer"] for e in problem["errors"]))


if __name__ == "__main__":
    main()
