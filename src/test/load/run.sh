#!/usr/bin/env bash
# Load test of the packaged app on loopback: starts target/*.jar on a throwaway H2 file database in a
# temporary folder, waits for /actuator/health, runs wrk against POST /api/v1/plans (each body in bodies/) and
# GET of the plan page at 8 and 32 connections, prints requests/s, p50/p99 latency and errors, and
# stops the app it started.
#
#   src/test/load/run.sh                     (from the project folder; builds the jar first if there is none)
#
# Settings (environment): DURATION (20s per run), CONNECTIONS ("8 32"), THREADS (2, one per core),
# WARMUP (10s, not reported: lets the JIT compile the engine), PORT (a free one from 18080 up),
# PROFILE (demo: the demo kitchen and its accounts), PAGE_PATH (the demo chips plan), LOGIN_USER /
# LOGIN_PASSWORD to sign in for the page (it needs a signed-in cook; default the demo cook); if the
# page still redirects to the sign-in form its runs are skipped.
# Goal (issue 6): >= 300 requests/s for the plans API at 32 connections, 0 errors, p99 < 200 ms.
set -euo pipefail

here="$(cd "$(dirname "$0")" && pwd)"
project="$(cd "$here/../../.." && pwd)"
DURATION="${DURATION:-20s}"
CONNECTIONS="${CONNECTIONS:-8 32}"
THREADS="${THREADS:-2}"
WARMUP="${WARMUP:-10s}"
# the plan page with a plan computed: the demo kitchen's chips (surface 4) in its fryer (setup 6) to golden
PAGE_PATH="${PAGE_PATH:-/plan?surfaceId=4&setupId=6&targetStage=golden}"
# the demo profile loads the invented demo kitchen (surfaces, setups, accounts) into the empty database
PROFILE="${PROFILE:-demo}"
# the demo kitchen's cook account, which its sign-in page lists; set LOGIN_USER= (empty) to load anonymously
LOGIN_USER="${LOGIN_USER-cook}"
LOGIN_PASSWORD="${LOGIN_PASSWORD-cook-demo}"

for tool in wrk curl java; do
  command -v "$tool" >/dev/null || { echo "src/test/load/run.sh: '$tool' is not installed (Debian: apt-get install -y $tool)" >&2; exit 2; }
done

jar="${JAR:-}"
if [ -z "$jar" ]; then
  jar="$(ls "$project"/target/*.jar 2>/dev/null | grep -v -- '-plain.jar$' | head -1 || true)"
fi
if [ -z "$jar" ]; then
  echo "== no jar in target/: building it (mvn -q -DskipTests package)"
  (cd "$project" && mvn -q -DskipTests package)
  jar="$(ls "$project"/target/*.jar | grep -v -- '-plain.jar$' | head -1)"
fi

port_free() { ! (exec 3<>"/dev/tcp/127.0.0.1/$1") 2>/dev/null; }
if [ -z "${PORT:-}" ]; then
  PORT=18080
  while ! port_free "$PORT"; do PORT=$((PORT + 1)); done
fi
base="http://127.0.0.1:$PORT"

work="$(mktemp -d -t crustplan-load.XXXXXX)"
app_pid=""
cleanup() {
  if [ -n "$app_pid" ] && kill -0 "$app_pid" 2>/dev/null; then
    kill "$app_pid" 2>/dev/null || true
    for _ in $(seq 1 60); do kill -0 "$app_pid" 2>/dev/null || break; sleep 0.5; done
    kill -9 "$app_pid" 2>/dev/null || true
  fi
  rm -rf "$work"
}
trap cleanup EXIT INT TERM

echo "== starting $(basename "$jar") on $base (database in $work)"
java -jar "$jar" \
  --server.address=127.0.0.1 --server.port="$PORT" \
  --spring.datasource.url="jdbc:h2:file:$work/db/crustplan;WRITE_DELAY=0" \
  --spring.profiles.active="$PROFILE" \
  >"$work/app.log" 2>&1 &
app_pid=$!

for i in $(seq 1 240); do
  if curl -fsS "$base/actuator/health" 2>/dev/null | grep -q '"UP"'; then
    break
  fi
  if ! kill -0 "$app_pid" 2>/dev/null; then
    echo "the app stopped while starting; its log:" >&2; tail -50 "$work/app.log" >&2; exit 1
  fi
  if [ "$i" = 240 ]; then
    echo "no healthy app after 120 s; its log:" >&2; tail -50 "$work/app.log" >&2; exit 1
  fi
  sleep 0.5
done
echo "== healthy after $(( (i + 1) / 2 )) s"

# each body must be answered 200 before it is loaded: a 400 here means the API changed shape
for body in "$here"/bodies/*.json; do
  status="$(curl -s -o "$work/answer.json" -w '%{http_code}' -H 'Content-Type: application/json' --data-binary "@$body" "$base/api/v1/plans")"
  if [ "$status" != 200 ]; then
    echo "POST /api/v1/plans with $(basename "$body") answered $status:" >&2; head -c 600 "$work/answer.json" >&2; echo >&2; exit 1
  fi
done

cookie=""
if [ -n "${LOGIN_USER:-}" ]; then
  jar_file="$work/cookies"
  csrf="$(curl -s -c "$jar_file" -b "$jar_file" "$base/signin" | sed -n 's/.*name="_csrf"[^>]*value="\([^"]*\)".*/\1/p' | head -1)"
  curl -s -o /dev/null -c "$jar_file" -b "$jar_file" --data-urlencode "username=$LOGIN_USER" \
    --data-urlencode "password=${LOGIN_PASSWORD:-}" --data-urlencode "_csrf=$csrf" "$base/signin"
  # curl writes HttpOnly cookies (the session) behind a "#HttpOnly_" prefix
  cookie="$(sed 's/^#HttpOnly_//' "$jar_file" | awk '!/^#/ && NF >= 7 { printf "%s%s=%s", sep, $6, $7; sep="; " }')"
fi
page_status="$(curl -s -o /dev/null -w '%{http_code}' ${cookie:+-H "Cookie: $cookie"} "$base$PAGE_PATH")"
page_ok=true
if [ "$page_status" != 200 ]; then
  echo "== GET $PAGE_PATH answered $page_status (sign-in needed? set LOGIN_USER and LOGIN_PASSWORD): page runs skipped"
  page_ok=false
fi

run() { # name connections url [body] [cookie]
  local line
  line="$(wrk -t"$THREADS" -c"$2" -d"$DURATION" --timeout 10s -s "$here/report.lua" "$3" -- "${4:-}" "${5:-}" | grep '^RESULT' || true)"
  [ -n "$line" ] || { echo "wrk printed no result for $1" >&2; return 1; }
  printf '%-34s %5s %s\n' "$1" "$2" "${line#RESULT }"
}

echo "== warm-up $WARMUP (not reported)"
wrk -t"$THREADS" -c8 -d"$WARMUP" -s "$here/report.lua" "$base/api/v1/plans" -- "$here/bodies/chips-fryer.json" >/dev/null
wrk -t"$THREADS" -c8 -d"$WARMUP" -s "$here/report.lua" "$base/api/v1/plans" -- "$here/bodies/steak-pan.json" >/dev/null

echo "== $(date -u +%FT%TZ), $(nproc) cores, load average $(cut -d' ' -f1-3 /proc/loadavg), wrk $THREADS threads, $DURATION per run"
printf '%-34s %5s %s\n' "run" "conns" "figures (not_200 and socket_errors are the errors)"
for c in $CONNECTIONS; do
  for body in "$here"/bodies/*.json; do
    run "POST /api/v1/plans $(basename "$body" .json)" "$c" "$base/api/v1/plans" "$body"
  done
  if $page_ok; then
    run "GET $PAGE_PATH" "$c" "$base$PAGE_PATH" "" "$cookie"
  fi
done
echo "== stopping the app"
