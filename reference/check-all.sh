#!/bin/bash
# Regenerates every reference table into a temporary directory and compares it with the committed
# one. Exit 0: all identical. Exit 1: a table differs (a short diff summary is printed).
# Exit 2: a generator failed. Usage: bash reference/check-all.sh
set -u
here="$(cd "$(dirname "$0")" && pwd)"
committed="$here/../plugin/src/test/resources/reference"
tmp="$(mktemp -d)"
trap 'rm -rf "$tmp"' EXIT
status=0
for gen in almanac_swetest stars_swetest topocentric_swetest planning_pyephem planning_moving_pyephem; do
  if ! /usr/bin/python3 "$here/$gen.py" "$tmp" > "$tmp/$gen.log" 2>&1; then
    echo "FAIL $gen: generator failed:"; tail -20 "$tmp/$gen.log"; exit 2
  fi
done
for t in almanac-swetest.tsv stars-swetest.tsv topocentric-swetest.tsv planning-pyephem.tsv planning-moving-pyephem.tsv; do
  if [ ! -f "$committed/$t" ]; then
    echo "DIFF $t: no committed table"; status=1; continue
  fi
  if cmp -s "$committed/$t" "$tmp/$t"; then
    echo "same $t ($(wc -l < "$tmp/$t") lines)"
  else
    n=$(diff "$committed/$t" "$tmp/$t" | grep -c '^[<>]')
    echo "DIFF $t: $n changed lines (committed <, regenerated >); first ones:"
    diff "$committed/$t" "$tmp/$t" | grep '^[<>]' | head -6 | cut -c1-240
    status=1
  fi
done
exit $status
