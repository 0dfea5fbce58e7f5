#!/usr/bin/env python3
"""Triage one demo sample and a small batch with colloidtriage, using only
Python's standard library. Usage: python3 examples/triage.py [BASE_URL]"""
import json
import sys
import urllib.error
import urllib.request
from pathlib import Path

BASE = sys.argv[1] if len(sys.argv) > 1 else "http://127.0.0.1:8080"
DEMO = Path(__file__).resolve().parent.parent / "testdata" / "demo"


def post(path, body, content_type="application/json"):
    req = urllib.request.Request(BASE + path, data=body, method="POST",
                                 headers={"Content-Type": content_type})
    try:
        with urllib.request.urlopen(req, timeout=30) as resp:
            return resp.status, json.load(resp)
    except urllib.error.HTTPError as err:  # 4xx: a problem detail
        return err.code, json.load(err)


def main():
    sample = json.loads((DEMO / "gravity_settling.json").read_text())
    status, report = post("/v1/triage", json.dumps(sample).encode())
    assert status == 200, report
    top = report["causes"][0]
    print(f"{report['sample_id']}: {top['id']} (score {top['score']})")
    for remedy in top["remedies"]:
        print("  -", remedy["action"])

    bad = dict(sample, sample_id="BAD-1", particles=dict(sample["particles"], diameter_nm=-3))
    status, batch = post("/v1/triage/batch", json.dumps({"samples": [sample, bad]}).encode())
    assert status == 200, batch
    for item in batch["items"]:
        if item["status"] == 200:
            print(f"{item['sample_id']}: {item['report']['causes'][0]['id']}")
        else:
            fields = ", ".join(e["pointer"] for e in item["problem"].get("errors", []))
            print(f"{item['sample_id']}: rejected ({fields})")
    assert batch["items"][1]["status"] == 422


if __name__ == "__main__":
    main()
