#!/usr/bin/env bash
# Whole-process comparison of `sightwork chart` with GMT drawing the same extent to PNG at the same
# width (1920 px), both from full-resolution GSHHG shorelines, timed by hyperfine.
# Needs: gmt, gmt-gshhg-full, hyperfine (Debian); run from the repository root after ./sightwork --help
# has built the project. See docs/PERFORMANCE.md, "Chart rendering".
set -euo pipefail
command -v gmt >/dev/null || sudo apt-get install -y gmt gmt-gshhg-full
command -v hyperfine >/dev/null || sudo apt-get install -y hyperfine
root="$(cd "$(dirname "$0")/.." && pwd)"
out="$(mktemp -d)"
cat > "$out/gmt.sh" <<GMT
#!/usr/bin/env bash
set -e; d=\$(mktemp -d); cd "\$d"
gmt begin demo png E100
gmt coast -R-29.0/-24.6/36.8/39.2 -JM19.2i -Df -Gwheat -Slightblue -W0.5p -Bafg
gmt end
cp demo.png "$out/gmt.png"; rm -rf "\$d"
GMT
cat > "$out/sightwork.sh" <<SW
#!/usr/bin/env bash
exec "$root/sightwork" chart --extent 36.8,-29.0,39.2,-24.6 --size 1920x1080 --no-plugins --out "$out/sightwork.png" 2>/dev/null
SW
chmod +x "$out/gmt.sh" "$out/sightwork.sh"
hyperfine -w 1 -r "${RUNS:-5}" --export-markdown "$out/hyperfine.md" "$out/gmt.sh" "$out/sightwork.sh"
echo "images and table in $out"
