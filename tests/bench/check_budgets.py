#!/usr/bin/env python3
"""Compares the figures of a benchmark run with the budgets.

usage: check_budgets.py BUDGETS_FILE WORK_DIR

WORK_DIR holds the Google Benchmark JSON of each bench_* program (*.json) and the MEASURE lines of each measure_*
program (*.measure). Prints one line per budget, `BUDGET <name> <measured> <budget> ok|MISS`, and exits 1 if any
budget is missed or has no figure.
"""
import glob
import json
import os
import sys

UNITS = {"ns": 1e-9, "us": 1e-6, "ms": 1e-3, "s": 1.0, "B": 1.0, "kB": 1e3, "MB": 1e6}
TIME_UNITS = {"ns": 1e-9, "us": 1e-6, "ms": 1e-3, "s": 1.0}


def read_figures(work):
    """Every figure by name, in SI (seconds or bytes)."""
    figures = {}
    for path in sorted(glob.glob(os.path.join(work, "*.json"))):
        with open(path, encoding="utf-8") as f:
            data = json.load(f)
        for bench in data.get("benchmarks", []):
            # With repetitions the median aggregate is compared; a single run counts as its own median.
            if bench.get("run_type") == "aggregate" and bench.get("aggregate_name") != "median":
                continue
            name = bench.get("run_name", bench["name"])
            if bench.get("run_type") == "iteration" and name in figures:
                continue  # repetitions: the median aggregate (read above or below) wins
            seconds = bench["real_time"] * TIME_UNITS[bench.get("time_unit", "ns")]
            if bench.get("run_type") == "aggregate" or name not in figures:
                figures[name] = seconds
    for path in sorted(glob.glob(os.path.join(work, "*.measure"))):
        with open(path, encoding="utf-8") as f:
            for line in f:
                parts = line.split()
                if len(parts) == 4 and parts[0] == "MEASURE" and parts[3] in UNITS:
                    figures[parts[1]] = float(parts[2]) * UNITS[parts[3]]
    return figures


def show(value, unit):
    return f"{value / UNITS[unit]:.4g}{unit}"


def main():
    if len(sys.argv) != 3:
        print(__doc__.strip(), file=sys.stderr)
        return 2
    budgets_path, work = sys.argv[1], sys.argv[2]
    figures = read_figures(work)
    missed = False
    with open(budgets_path, encoding="utf-8") as f:
        for raw in f:
            line = raw.split("#", 1)[0].strip()
            if not line:
                continue
            name, source, budget, unit = line.split()
            limit = float(budget) * UNITS[unit]
            if source not in figures:
                print(f"BUDGET {name} none {budget}{unit} MISS (no figure named {source})")
                missed = True
                continue
            measured = figures[source]
            verdict = "ok" if measured <= limit else "MISS"
            missed = missed or verdict == "MISS"
            print(f"BUDGET {name} {show(measured, unit)} {budget}{unit} {verdict}")
    return 1 if missed else 0


if __name__ == "__main__":
    sys.exit(main())
