#!/usr/bin/env python3
"""Prints Markdown tables from a JMH JSON result file (java -jar benchmarks.jar -rf json -rff FILE).

Usage: summarise.py FILE.json
Scores are JMH's primary metric (mean over measurement iterations) with its 99.9 % error; ratios are of means.
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
    print("| benchmark | params | score | error (99.9 %) | unit | iterations |")
    print("|---|---|---|---|---|---|")
    by = {}
    for r in results:
        m = r["primaryMetric"]
        by[(short(r["benchmark"]), params(r))] = m["score"]
        print(f"| {short(r['benchmark'])} | {params(r)} | {m['score']:.4g} | {m['scoreError']:.2g} "
              f"| {m['scoreUnit']} | {len(m['rawData'][0])} |")
    pairs = [("TrialEvaluationBenchmark.structuralTrial", "TrialEvaluationBenchmark.allCodesTrial"),
             ("TrialEvaluationBenchmark.structuralEvaluate", "TrialEvaluationBenchmark.allCodesEvaluate")]
    for a, b in pairs:
        if (a, "") in by and (b, "") in by:
            print(f"\nspeed-up {a.split('.')[-1]} / {b.split('.')[-1]}: {by[(a, '')] / by[(b, '')]:.0f}x")
    one = by.get(("MonteCarloRunBenchmark.structuralRun", "threads=1"))
    two = by.get(("MonteCarloRunBenchmark.structuralRun", "threads=2"))
    if one and two:
        print(f"structuralRun 2 threads / 1 thread: {two / one:.2f}x")


if __name__ == "__main__":
    main(sys.argv[1])
