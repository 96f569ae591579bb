"""The benchmark sheet evaluated with pint, one timed run at a time on request.

Usage: /usr/bin/python3 pint_chain.py BODY.py
The body (written by the harness) has one Python line per sheet line. Protocol, one JSON object
per line on standard output:
  at start:            {"pint", "python", "import_s", "compile_s"}
  for each "run" read: {"run_s", "cpu_s"}  (one exec of the body, wall and thread CPU seconds)
  for "end" read:      the final values in SI, for a cross-check against CutSheet and the floor
The harness times CutSheet just before and just after each run, so that each pint run is
compared with CutSheet measured in the same few seconds of the shared host.
"""
import json
import math
import sys
import time

t0 = time.perf_counter()
import pint  # noqa: E402

u = pint.UnitRegistry()
u.Quantity(1, "mm").to("inch")  # build the registry's caches once, as any real script would
t_import = time.perf_counter() - t0


def lead_angle(lead, d):
    """The library function: two require clauses, then tan(lambda) = P_h / (pi d)."""
    if not d > 0 * u.mm:
        raise ValueError("the diameter is positive")
    if not lead > 0 * u.mm:
        raise ValueError("the lead is positive")
    return math.atan((lead / (math.pi * d)).m_as("")) * u.radian


def say(obj):
    print(json.dumps(obj), flush=True)


def main():
    body_path = sys.argv[1]
    with open(body_path, encoding="utf-8") as f:
        body = f.read()
    t1 = time.perf_counter()
    code = compile(body, body_path, "exec")
    t_compile = time.perf_counter() - t1
    say({"pint": pint.__version__, "python": sys.version.split()[0], "import_s": t_import, "compile_s": t_compile})
    ns = {}
    for line in sys.stdin:
        command = line.strip()
        if command == "run":
            ns = {"u": u, "math": math, "lead_angle": lead_angle}
            t = time.perf_counter()
            c = time.thread_time()
            exec(code, ns)
            dc = time.thread_time() - c
            dt = time.perf_counter() - t
            say({"run_s": dt, "cpu_s": dc})
        elif command == "end":
            break
    xs = [k for k in ns if k.startswith("x") and k[1:].isdigit()]
    fs = [k for k in ns if k.startswith("F") and k[1:].isdigit()]
    last_x = max(xs, key=lambda k: int(k[1:]))
    last_f = max(fs, key=lambda k: int(k[1:]))
    say({
        "last_x": last_x,
        "x_m": ns[last_x].to("m").magnitude,
        "last_F": last_f,
        "F_N": ns[last_f].to("N").magnitude,
    })


main()
