#!/usr/bin/env bash
# Checks one member with curl: a shelf beam of Fernhollow Racking, a fictional maker of steel shelving
# (an RHS 100x50x4 in S355 over 2.7 m, pinned and roller, boxed stock along it, its own weight added).
#
#   bash examples/curl/check-member.sh [baseUrl]
#
# baseUrl: the first argument, else MEMBERPROOF_URL, else http://127.0.0.1:3000. With jq installed it
# prints the verdict, the governing failure mode and its utilization; without, the whole answer.
# Exit status: 0 for an answer (a "fail" verdict too), 1 when the service cannot be reached, 2 when it
# answers with a problem (application/problem+json).
set -euo pipefail

base_url="${1:-${MEMBERPROOF_URL:-http://127.0.0.1:3000}}"
body_file="$(mktemp)"
trap 'rm -f "$body_file"' EXIT

request='{
  "member": {
    "length": "2.7 m",
    "supports": [
      { "position": 0, "type": "pinned", "label": "left upright" },
      { "position": "2.7 m", "type": "roller", "label": "right upright" }
    ]
  },
  "section": { "designation": "RHS 100x50x4" },
  "material": { "grade": "S355" },
  "loads": [ { "type": "distributed", "from": 0, "to": "2.7 m", "qy": "-3.2 kN/m", "label": "boxed stock" } ],
  "selfWeight": true,
  "output": { "samples": 11, "units": { "length": "mm", "force": "kN", "moment": "kN*m", "stress": "MPa" } }
}'

if ! status="$(curl --silent --show-error --output "$body_file" --write-out '%{http_code}' \
  --header 'content-type: application/json' --data "$request" "$base_url/v1/member-checks")"; then
  echo "cannot reach Memberproof at $base_url" >&2
  exit 1
fi

if [ "$status" -ge 400 ]; then
  if command -v jq >/dev/null 2>&1; then
    jq -r '"HTTP \(.status) \(.title): \(.detail)", (.errors // [] | .[] | "    at \(.pointer): \(.message)")' "$body_file" >&2
  else
    echo "HTTP $status" >&2
    cat "$body_file" >&2
    echo >&2
  fi
  exit 2
fi

if command -v jq >/dev/null 2>&1; then
  jq -r '"verdict: \(.verdict)",
         (if .governing then "governing: \(.governing.mode) at utilization \(.governing.utilization * 1000 | round / 1000)" else "governing: none (no demand)" end),
         "",
         .notices[0]' "$body_file"
else
  cat "$body_file"
  echo
fi
