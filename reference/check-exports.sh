#!/usr/bin/env bash
# Reads Sightwork's exports back with GDAL/OGR (ogrinfo) and poppler (pdftotext), readers that share
# no code with ours. Not run by mvn; run by hand or from .ci/run:
#   reference/check-exports.sh
# Needs: gdal-bin, poppler-utils (apt-get install -y gdal-bin poppler-utils), Maven, Java 17.
set -euo pipefail
here="$(cd "$(dirname "${BASH_SOURCE[0]}")/.." && pwd)"
for tool in ogrinfo pdftotext; do
  command -v "$tool" >/dev/null || { echo "check-exports: $tool is missing (apt-get install -y gdal-bin poppler-utils)" >&2; exit 1; }
done
out="$(mktemp -d)"
trap 'rm -rf "$out"' EXIT
(cd "$here" && mvn -q -B -pl plugin -am test -Dtest=ExportReadBackTest -Dsurefire.failIfNoSpecifiedTests=false \
   -Dsightwork.exportDir="$out") >&2
echo "check-exports: $(ogrinfo --version)"
fail=0
expect() { # what, pattern, text
  if grep -qE -- "$2" <<<"$3"; then echo "ok   $1"; else echo "FAIL $1 (expected /$2/)"; fail=1; fi
}

gj="$(ogrinfo -ro -al "$out/plot.geojson")"
expect "GeoJSON: 6 features"                 "Feature Count: 6"                      "$gj"
expect "GeoJSON: fix as POINT lon lat"       "POINT \(-27.6543210987 38.123456789\)"  "$gj"
expect "GeoJSON: LOP as LINESTRING"          "LINESTRING \(-28.4 38.5,-28.35 38.7\)"  "$gj"
expect "GeoJSON: ellipse as POLYGON"         "POLYGON \(\("                          "$gj"

gpx="$(ogrinfo -ro -al "$out/plot.gpx")"
expect "GPX: waypoints layer with 2"         "Layer name: waypoints"                 "$gpx"
expect "GPX: fix waypoint time"              "time \(DateTime\) = 2026/06/21 20:31:00" "$gpx"
expect "GPX: fix waypoint position"          "POINT \(-27\.654321[0-9]* 38\.123456[0-9]*\)"  "$gpx"
expect "GPX: LOP as route"                   "Layer name: routes"                    "$gpx"
expect "GPX: running-fix LOP type"           "type \(String\) = running-fix LOP"     "$gpx"
expect "GPX: track"                          "Layer name: tracks"                    "$gpx"

gp="$(ogrinfo -ro -al "$out/plot.gpkg")"
expect "GeoPackage: lines layer"             "Layer name: lines"                     "$gp"
expect "GeoPackage: points layer"            "Layer name: points"                    "$gp"
expect "GeoPackage: ellipses layer"          "Layer name: ellipses"                  "$gp"
expect "GeoPackage: tracks layer"            "Layer name: tracks"                    "$gp"
expect "GeoPackage: WGS 84"                  "WGS 84"                                "$gp"
expect "GeoPackage: fix point"               "POINT \(-27.6543210987 38.123456789\)"  "$gp"
expect "GeoPackage: fix time"                "utc \(DateTime\) = 2026/06/21 20:31:00" "$gp"
expect "GeoPackage: ellipse axis"            "ellipse95_semi_major_nm \(Real\) = 1.8" "$gp"
valid="$(ogrinfo -ro -q "$out/plot.gpkg" -sql "SELECT count(*) AS n FROM points" 2>&1)"
expect "GeoPackage: SQL count of points"     "n \(Integer[0-9]*\) = 2"               "$valid"

pdf="$(pdftotext "$out/worksheet.pdf" -)"
expect "PDF: heading"                        "Sun LL 09:12:30 UTC"                   "$pdf"
expect "PDF: value"                          "45°12.3'"                              "$pdf"

exit $fail
