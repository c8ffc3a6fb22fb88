#!/usr/bin/env python3
"""Checks one member with Memberproof, Python 3 standard library only.

A work-platform joist of Fernhollow Racking, a fictional maker of steel shelving and work platforms:
an IPE 140 in S275 over 3.0 m, pinned and roller, grating and foot traffic along it and a fitter with a
parts cart at 1.8 m, its own weight added.

    python3 examples/python/check_member.py [base_url]

base_url: the first argument, else MEMBERPROOF_URL, else http://127.0.0.1:3000. Exit status: 0 for an
answer (a "fail" verdict too), 1 when the service cannot be reached, 2 when it answers with a problem
(RFC 9457, application/problem+json): its title, detail and the JSON pointers of the fields at fault are
printed.
"""

import json
import os
import sys
import urllib.error
import urllib.request

DEFAULT_BASE_URL = "http://127.0.0.1:3000"

REQUEST = {
    "member": {
        "length": "3.0 m",
        "supports": [
            {"position": 0, "type": "pinned", "label": "edge beam"},
            {"position": "3.0 m", "type": "roller", "label": "back beam"},
        ],
    },
    "section": {"designation": "IPE 140"},
    "material": {"grade": "S275"},
    "loads": [
        {"type": "distributed", "from": 0, "to": "3.0 m", "qy": "-1.8 kN/m", "label": "grating and foot traffic"},
        {"type": "point", "position": "1.8 m", "fy": "-4.5 kN", "label": "fitter with a parts cart"},
    ],
    "selfWeight": True,
    "output": {"samples": 11, "units": {"length": "mm", "force": "kN", "moment": "kN*m", "stress": "MPa"}},
}


def base_url_from(args, environment):
    """The first argument, else MEMBERPROOF_URL, else the local default."""
    return (args[0] if args else "") or environment.get("MEMBERPROOF_URL") or DEFAULT_BASE_URL


def check_member(base_url, body, timeout=30):
    """POSTs one member check; returns the parsed answer, raises urllib.error.HTTPError on a 4xx or 5xx."""
    request = urllib.request.Request(
        base_url.rstrip("/") + "/v1/member-checks",
        data=json.dumps(body).encode("utf-8"),
        headers={"content-type": "application/json", "accept": "application/json, application/problem+json"},
        method="POST",
    )
    with urllib.request.urlopen(request, timeout=timeout) as response:
        return json.load(response)


def print_problem(error):
    """Prints a problem answer: status, title, detail, and each field at fault by its JSON pointer."""
    raw = error.read().decode("utf-8", errors="replace")
    try:
        problem = json.loads(raw)
    except ValueError:
        problem = None
    if not isinstance(problem, dict):
        print(f"HTTP {error.code}: {raw.strip() or error.reason}", file=sys.stderr)
        return
    print(f"HTTP {error.code} {problem.get('title', '')}: {problem.get('detail', '')}", file=sys.stderr)
    for field in problem.get("errors", []):
        print(f"    at {field.get('pointer')}: {field.get('message')}", file=sys.stderr)
    if problem.get("nearest"):
        print(f"    nearest: {', '.join(problem['nearest'])}", file=sys.stderr)


def main(args):
    base_url = base_url_from(args, os.environ)
    try:
        answer = check_member(base_url, REQUEST)
    except urllib.error.HTTPError as error:
        print_problem(error)
        return 2
    except OSError as error:
        # URLError (refused, unknown host), a timeout or a reset connection: no answer came.
        reason = error.reason if isinstance(error, urllib.error.URLError) else error
        print(f"cannot reach Memberproof at {base_url}: {reason}", file=sys.stderr)
        return 1

    print(f"verdict: {answer['verdict']}")
    governing = answer.get("governing")
    if governing is None:
        print("governing: none (no demand)")
    else:
        print(f"governing: {governing['mode']} at utilization {governing['utilization']:.3f}")
    print()
    print(answer["notices"][0])
    return 0


if __name__ == "__main__":
    sys.exit(main(sys.argv[1:]))
