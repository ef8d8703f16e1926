#!/bin/sh
# Browser check: opens the HTML study report, a page that imports the ESM bundle and a page that
# runs the worker pool on module Web Workers in headless Chromium (Debian's `chromium` package),
# and fails on console errors, on missing or empty SVG plots, on a blank page, or when the pooled
# rows differ from the calling thread's. Keeps screenshots in $OUT (default: browser-check/) as artifacts.
#
# Needs: a built bundle (npm run build), node with tsx, python3 (static server on loopback),
# chromium. Usage: sh scripts/browser-check.sh [output-directory]
set -eu

ROOT=$(cd "$(dirname "$0")/.." && pwd)
OUT=${1:-"$ROOT/browser-check"}
CHROMIUM=${CHROMIUM:-chromium}
PORT=${PORT:-8765}
DIST=${DIST:-"$ROOT/dist"}

command -v "$CHROMIUM" >/dev/null 2>&1 || { echo "browser-check: $CHROMIUM not found (apt-get install -y chromium)" >&2; exit 1; }
[ -f "$DIST/index.js" ] || { echo "browser-check: $DIST/index.js missing; run npm run build first" >&2; exit 1; }

rm -rf "$OUT"
mkdir -p "$OUT/site"
cp -R "$DIST" "$OUT/site/dist"

# 1. the HTML report of the bearing-race demo
(cd "$ROOT" && npx tsx scripts/demo.ts docs/examples/study-bearing-race.json "$OUT/site/report.html" >/dev/null)

# 2. a page that imports the ESM bundle, runs a study and writes a marker into the DOM
cp "$ROOT/docs/examples/study-bearing-race.json" "$OUT/site/study.json"
cat > "$OUT/site/bundle.html" <<'HTML'
<!DOCTYPE html>
<html lang="en"><head><meta charset="utf-8"/><title>fluxwright bundle check</title></head>
<body><h1>fluxwright in the browser</h1><pre id="result">running…</pre>
<script type="module">
  const out = document.getElementById("result");
  window.addEventListener("error", (e) => { out.textContent = "failed: " + e.message; out.dataset.status = "failed"; });
  try {
    const { studyHeater, formatQuantity } = await import("./dist/index.js");
    const description = await (await fetch("./study.json")).json();
    const s = studyHeater(description, { impedanceSweep: false });
    const numbers = [s.operating.frequency, s.operating.losses.part, s.heatUp.timeToTarget];
    if (!numbers.every((n) => Number.isFinite(n) && n > 0)) throw new Error("non-finite study numbers " + numbers);
    out.textContent = formatQuantity(s.operating.frequency, "Hz") + ", " + formatQuantity(s.operating.losses.part, "W");
    out.dataset.status = "ok";
  } catch (e) {
    console.error(e);
    out.textContent = "failed: " + (e && e.message);
    out.dataset.status = "failed";
  }
</script></body></html>
HTML

# 3. a page that runs sweeps on the worker pool with module Web Workers (the worker script served
# from dist/study/heater-worker.js): the rows equal the calling thread's, progress arrives, an
# abort stops the stream. Workers run in real time, which --dump-dom's virtual time does not wait
# for, so the page reports by a request the static server logs ("study.json?pool-result=…").
cat > "$OUT/site/pool.html" <<'HTML'
<!DOCTYPE html>
<html lang="en"><head><meta charset="utf-8"/><title>fluxwright worker pool check</title></head>
<body><h1>fluxwright worker pool in the browser</h1><pre id="result">running…</pre>
<script type="module">
  const out = document.getElementById("result");
  // the page reports to the static server by a request the server logs (the check reads its log)
  const report = (status, text) => fetch("./study.json?" + new URLSearchParams({ "pool-result": status, text })).catch(() => undefined);
  const fail = (m) => { out.textContent = "failed: " + m; out.dataset.status = "failed"; void report("failed", String(m)); };
  window.addEventListener("error", (e) => fail(e.message));
  try {
    const { sweepHeater, sweepHeaterStream } = await import("./dist/index.js");
    const description = await (await fetch("./study.json")).json();
    const spec = { field: "capacitor.capacitance", values: ["2.2 µF", "2.7 µF", "3.3 µF", "3.9 µF", "-1 µF", "4.7 µF", "5.6 µF"], heatUp: false };
    const workerUrl = new URL("./dist/study/heater-worker.js", location.href);
    const single = JSON.stringify(sweepHeater(description, spec));
    const seen = [];
    const pooled = await sweepHeater(description, spec, { workers: 2, workerUrl, onProgress: (p) => seen.push(p.done) });
    if (JSON.stringify(pooled) !== single) throw new Error("pooled sweep differs from the single-thread sweep");
    if (seen.length === 0 || seen[seen.length - 1] !== spec.values.length) throw new Error("progress " + seen.join(","));
    const controller = new AbortController();
    let rows = 0, aborted = false;
    try {
      for await (const row of sweepHeaterStream(description, { ...spec, values: Array(200).fill("3.3 µF"), heatUp: true }, { workers: 2, workerUrl, signal: controller.signal })) {
        rows++;
        if (rows === 2) controller.abort();
      }
    } catch (e) { aborted = controller.signal.aborted; }
    if (!aborted) throw new Error("abort did not stop the stream");
    let refused = false;
    try { await sweepHeater(description, spec, { workers: 2 }); } catch (e) { refused = /workerUrl/.test(e.message); }
    if (!refused) throw new Error("no workerUrl outside Node was not refused by name");
    out.textContent = "2 Web Workers: " + spec.values.length + " rows identical to the calling thread; progress " + seen.join(",") + "; aborted after " + rows + " rows";
    out.dataset.status = "ok";
    void report("ok", out.textContent);
  } catch (e) { console.error(e); fail(e && e.message); }
</script></body></html>
HTML

python3 -m http.server "$PORT" --bind 127.0.0.1 --directory "$OUT/site" >"$OUT/server.log" 2>&1 &
SERVER=$!
BROWSER=""
trap 'kill "$SERVER" $BROWSER 2>/dev/null || true' EXIT INT TERM
i=0
until python3 -c "import urllib.request; urllib.request.urlopen('http://127.0.0.1:$PORT/report.html')" 2>/dev/null; do
  i=$((i + 1)); [ "$i" -lt 50 ] || { echo "browser-check: static server did not start" >&2; exit 1; }; sleep 0.1
done

# a killed browser's child processes may still write into its profile for a moment: retry,
# and never fail the check on a temporary directory
drop_profile() { rm -rf "$1" 2>/dev/null || { sleep 1; rm -rf "$1" 2>/dev/null; } || true; }
FLAGS="--headless --no-sandbox --disable-gpu --disable-quic --disable-background-networking --disable-component-update --disable-sync --no-first-run --enable-logging=stderr --v=0"
status=0
for page in report bundle; do
  url="http://127.0.0.1:$PORT/$page.html"
  profile=$(mktemp -d)
  "$CHROMIUM" $FLAGS --user-data-dir="$profile" --virtual-time-budget=10000 --dump-dom "$url" >"$OUT/$page.dom.html" 2>"$OUT/$page.console.log" || true
  "$CHROMIUM" $FLAGS --user-data-dir="$profile" --virtual-time-budget=10000 --window-size=1100,2400 --screenshot="$OUT/$page.png" "$url" >/dev/null 2>&1 || true
  drop_profile "$profile"
  if grep -E "CONSOLE|Uncaught" "$OUT/$page.console.log" | grep -qiE "error|uncaught"; then
    echo "browser-check: $page: console errors:" >&2; grep -E "CONSOLE|Uncaught" "$OUT/$page.console.log" >&2; status=1
  fi
  [ -s "$OUT/$page.png" ] || { echo "browser-check: $page: no screenshot" >&2; status=1; }
done

# the report: at least three SVG plots, each with drawn data; a title (not a blank page)
python3 - "$OUT/report.dom.html" <<'PY' || status=1
import re, sys
dom = open(sys.argv[1], encoding="utf-8").read()
svgs = re.findall(r"<svg\b.*?</svg>", dom, flags=re.S)
drawn = [s for s in svgs if re.search(r'class="(series|bar)"', s)]
title = re.search(r"<h1>([^<]+)</h1>", dom)
problems = []
if title is None or not title.group(1).strip(): problems.append("blank page (no title)")
if len(svgs) < 3: problems.append(f"only {len(svgs)} SVG plots")
if len(drawn) != len(svgs): problems.append(f"{len(svgs) - len(drawn)} empty SVG plots")
if problems:
    print("browser-check: report: " + "; ".join(problems), file=sys.stderr); sys.exit(1)
print(f"browser-check: report OK ({len(svgs)} plots)")
PY

# the pool page: headless Chromium runs until the page has reported (at most 180 s)
profile=$(mktemp -d)
"$CHROMIUM" $FLAGS --user-data-dir="$profile" "http://127.0.0.1:$PORT/pool.html" >"$OUT/pool.console.log" 2>&1 &
BROWSER=$!
i=0
until grep -q "pool-result=" "$OUT/server.log"; do
  i=$((i + 1)); [ "$i" -lt 1800 ] || break; sleep 0.1
done
kill "$BROWSER" 2>/dev/null || true
wait "$BROWSER" 2>/dev/null || true
drop_profile "$profile"
pool=$(grep -o "pool-result=[a-z]*&text=[^ ]*" "$OUT/server.log" | head -n 1 | python3 -c "import sys, urllib.parse; q = urllib.parse.parse_qs(sys.stdin.read().strip()); print(q.get('pool-result', ['none'])[0] + ': ' + q.get('text', [''])[0])")
case "$pool" in
  ok:*) echo "browser-check: worker pool OK (${pool#ok: })" ;;
  *) echo "browser-check: worker pool: ${pool:-no report within 180 s}" >&2; status=1 ;;
esac
if grep -E "CONSOLE|Uncaught" "$OUT/pool.console.log" | grep -qiE "error|uncaught"; then
  echo "browser-check: pool: console errors:" >&2; grep -E "CONSOLE|Uncaught" "$OUT/pool.console.log" >&2; status=1
fi

if grep -q 'data-status="ok"' "$OUT/bundle.dom.html"; then
  echo "browser-check: bundle OK ($(grep -o 'data-status="ok">[^<]*' "$OUT/bundle.dom.html" | sed 's/.*">//'))"
else
  echo "browser-check: bundle: $(grep -o 'data-status="failed">[^<]*' "$OUT/bundle.dom.html" | sed 's/.*">//' || true) (no success marker; blank page?)" >&2
  status=1
fi
echo "browser-check: screenshots in $OUT"
exit "$status"
