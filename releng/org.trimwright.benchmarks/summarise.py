#!/usr/bin/env python3
"""Prints Markdown tables from a JMH JSON result file (java -jar benchmarks.jar -rf json -rff FILE).

Usage: summarise.py FILE.json
Scores are JMH's primary metric (mean over measurement iterations) with its 99.9 % error; "best" is the best single
measurement iteration (highest throughput or lowest time), the figure least disturbed by other load on the machine.
Ratios are of means.
"""
import json
import sys


def short(name):
    return name.split(".")[-2] + "." + name.split(".")[-1]


def params(r):
    return ", ".join(f"{k}={v}" for k, v in (r.get("params") or {}).items())


def main(path):
    with open(path) as f:
        results = json.load(f)
    print("| benchmark | params | mean | error (99.9 %) | best | unit | iterations |")
    print("|---|---|---|---|---|---|---|")
    by = {}
    for r in results:
        m = r["primaryMetric"]
        by[(short(r["benchmark"]), params(r))] = m["score"]
        raw = [x for fork in m["rawData"] for x in fork]
        best = max(raw) if m["scoreUnit"].endswith("/s") else min(raw)
        print(f"| {short(r['benchmark'])} | {params(r)} | {m['score']:.4g} | {m['scoreError']:.2g} "
              f"| {best:.4g} | {m['scoreUnit']} | {len(raw)} |")
    t = "TrialEvaluationBenchmark."
    pairs = [(t + "structuralTrial", t + "allCodesTrial"), (t + "structuralEvaluate", t + "allCodesEvaluate"),
             (t + "structuralTrial", t + "leanAllCodesTrial"), (t + "structuralEvaluate", t + "leanAllCodesEvaluate")]
    print()
    for a, b in pairs:
        if (a, "") in by and (b, "") in by:
            print(f"speed-up {a.split('.')[-1]} / {b.split('.')[-1]}: {by[(a, '')] / by[(b, '')]:.0f}x")
    one = by.get(("MonteCarloRunBenchmark.structuralRun", "threads=1"))
    two = by.get(("MonteCarloRunBenchmark.structuralRun", "threads=2"))
    if one and two:
        print(f"structuralRun 2 threads / 1 thread: {two / one:.2f}x")


if __name__ == "__main__":
    main(sys.argv[1])
