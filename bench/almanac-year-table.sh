#!/usr/bin/env bash
# A year's hourly almanac of the Sun, Moon and the four planets as a whole process, sightwork beside
# swetest (Swiss Ephemeris command line, Debian swetest + swe-basic-data) making the same table,
# timed with hyperfine (3 runs each after one warm-up). Results: docs/PERFORMANCE.md, section Almanac.
#   bench/almanac-year-table.sh [YEAR]     (default 2026)
# swetest prints at most 36,525 lines a run, so it runs once per body (6 x 8760 lines).
set -euo pipefail
here="$(cd "$(dirname "${BASH_SOURCE[0]}")/.." && pwd)"
year="${1:-2026}"
ephe=/usr/share/libswe/ephe

need=()
command -v swetest >/dev/null && [ -f "$ephe/sepl_18.se1" ] && [ -f "$ephe/semo_18.se1" ] || need+=(swetest swe-basic-data)
command -v hyperfine >/dev/null || need+=(hyperfine)
if [ ${#need[@]} -gt 0 ]; then
  apt-get install -y "${need[@]}" || { apt-get update && apt-get install -y "${need[@]}"; }
fi

"$here/sightwork" almanac --at "$year-01-01T00:00:00Z" >/dev/null   # builds once if needed, outside the timing
tmp="$(mktemp -d)"
trap 'rm -rf "$tmp"' EXIT
cat >"$tmp/swe.sh" <<SWE
#!/bin/sh
for p in 0 1 3 4 5 6; do
  swetest -edir$ephe -b1.1.$year -utc00:00:00 -n8760 -s60m -p\$p -fPTadR/= -head -g,
done
SWE
chmod +x "$tmp/swe.sh"
# Same rows: 8760 hours x 6 bodies.
rows_sw=$("$here/sightwork" almanac --from "$year-01-01" --days 365 --step 1h --bodies sun,moon,planets --format csv | tail -n +2 | wc -l)
rows_se=$("$tmp/swe.sh" | wc -l)
echo "rows: sightwork $rows_sw, swetest $rows_se"
echo "swetest $(swetest -h | sed -n 's/.*Version: *\([^ ]*\).*/\1/p' | head -1), hyperfine $(hyperfine --version | cut -d' ' -f2), load before: $(cut -d' ' -f1-3 /proc/loadavg)"
hyperfine --warmup 1 --runs 3 --export-markdown "$tmp/result.md" \
  -n sightwork "$here/sightwork almanac --from $year-01-01 --days 365 --step 1h --bodies sun,moon,planets --format csv > /dev/null" \
  -n swetest "$tmp/swe.sh > /dev/null"
cat "$tmp/result.md"
echo "load after: $(cut -d' ' -f1-3 /proc/loadavg)"
