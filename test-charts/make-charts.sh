#!/usr/bin/env bash
# Makes the bundled chart data in test-charts/ from open data (see README.md beside this file):
#   world-base.gpkg     Natural Earth 1:10m land (public domain), via the npm package world-atlas
#   demo-region.gpkg    GSHHG full-resolution shorelines of the central and eastern Azores (LGPL)
#   probe-points.tsv    land/sea check points for the renderer's pixel tests
#   fixtures/           small files for the chart reader's tests, with EXPECTED.tsv from GDAL
#   CHECKS.txt          the checks this script ran and their figures
#   VERSIONS.txt        the exact tool and data versions used
# Usage: test-charts/make-charts.sh [--bench]
#   --bench  also makes a larger set (GSHHG full, Azores to the British Isles) in
#            test-charts/build/ for benchmarks; it is git-ignored and not committed.
# Re-runnable: every output is rewritten; GeoPackage timestamps are fixed so that an unchanged
# input gives unchanged files.  On a fresh Debian machine it installs what it needs (apt, npm).
set -euo pipefail

HERE=$(cd "$(dirname "${BASH_SOURCE[0]}")" && pwd)
PY=/usr/bin/python3                  # Debian's python3, which sees python3-shapely/-gdal
TOOL="$HERE/tools/charttool.py"
WORLD_ATLAS_VERSION=2.0.2            # npm world-atlas: Natural Earth 4.1.0 as TopoJSON
# sha256 of world-atlas 2.0.2's land-10m.json: the data this script was checked with.
LAND_10M_SHA256=9b9f584709c119d63fbadf484ce425260497697b7166be7a2fe360e8c0b171a8
WORLD_CELL_DEG=10                    # world land is cut on a 10 deg x 10 deg grid
# World land is simplified by 0.004 deg (about 440 m at the equator), about one step of the
# TopoJSON quantisation grid (0.0036 deg x 0.0017 deg) and well below what 1:10 000 000 data
# resolves (0.1 mm on paper is 1 km); it keeps the committed file to a few MB.
WORLD_SIMPLIFY_DEG=0.004
DEMO_REGION=-29.5/-24.5/36.5/39.9    # W/E/S/N degrees: central and eastern Azores
BENCH_REGION=-35/0/30/55             # W/E/S/N degrees: Azores, Madeira, Iberia, British Isles
# GeoPackage last_change stamps: fixed, so that re-running gives identical files.
export OGR_CURRENT_DATE=2024-01-01T00:00:00.000Z

BENCH=0
for arg in "$@"; do
  case "$arg" in
    --bench) BENCH=1 ;;
    -h|--help) sed -n '2,14p' "$0"; exit 0 ;;
    *) echo "make-charts.sh: unknown option '$arg' (expected --bench or --help)" >&2; exit 2 ;;
  esac
done

# ---- tools ---------------------------------------------------------------------------------
have_pkg() { dpkg-query -W -f='${Status}' "$1" 2>/dev/null | grep -q 'ok installed'; }
need=()
command -v ogr2ogr >/dev/null 2>&1 || need+=(gdal-bin)
command -v gmt >/dev/null 2>&1 || need+=(gmt)
for p in gmt-gshhg-full gmt-gshhg-high gmt-gshhg-low; do have_pkg "$p" || need+=("$p"); done
command -v npm >/dev/null 2>&1 || need+=(npm)
[ -x "$PY" ] || need+=(python3)
"$PY" -c 'import shapely' >/dev/null 2>&1 || need+=(python3-shapely)
"$PY" -c 'from osgeo import ogr' >/dev/null 2>&1 || need+=(python3-gdal)
if [ ${#need[@]} -gt 0 ]; then
  echo "installing: ${need[*]}"
  SUDO=""; [ "$(id -u)" -eq 0 ] || SUDO=sudo
  $SUDO apt-get update
  DEBIAN_FRONTEND=noninteractive $SUDO apt-get install -y --no-install-recommends "${need[@]}"
fi

WORK=$(mktemp -d "${TMPDIR:-/tmp}/make-charts.XXXXXX")
trap 'rm -rf "$WORK"' EXIT
cd "$WORK"   # GMT writes gmt.history into the working directory

echo "== world-atlas $WORLD_ATLAS_VERSION from npm"
npm install --prefix "$WORK/npm" --no-save --no-audit --no-fund --no-package-lock \
  "world-atlas@$WORLD_ATLAS_VERSION" >/dev/null
TOPO="$WORK/npm/node_modules/world-atlas/land-10m.json"
got=$(sed -n 's/.*"version": *"\([^"]*\)".*/\1/p' "$WORK/npm/node_modules/world-atlas/package.json")
[ "$got" = "$WORLD_ATLAS_VERSION" ] || { echo "FAIL: npm gave world-atlas $got" >&2; exit 1; }
TOPO_SHA=$(sha256sum "$TOPO" | cut -d' ' -f1)
[ "$TOPO_SHA" = "$LAND_10M_SHA256" ] ||
  { echo "FAIL: land-10m.json has sha256 $TOPO_SHA, expected $LAND_10M_SHA256" >&2; exit 1; }
INTEGRITY=$(npm view "world-atlas@$WORLD_ATLAS_VERSION" dist.integrity 2>/dev/null || echo unknown)

# ---- versions ------------------------------------------------------------------------------
pkgver() { dpkg-query -W -f='${Version}' "$1" 2>/dev/null || echo "not a Debian package"; }
GSHHG_VERSION=$(gmt coast -Vl -M -W -Df -R-26/-25/37/38 2>&1 >/dev/null |
                sed -n 's/.*GSHHG version \([0-9.]*\).*/\1/p' | head -1)
VERSIONS="$WORK/versions.tsv"
{
  printf 'item\tversion\n'
  printf 'gdal (ogr2ogr --version)\t%s\n' "$(ogr2ogr --version)"
  printf 'gdal-bin (Debian)\t%s\n' "$(pkgver gdal-bin)"
  printf 'python3-gdal (Debian)\t%s\n' "$(pkgver python3-gdal)"
  printf 'gmt (gmt --version)\t%s\n' "$(gmt --version)"
  printf 'gmt (Debian)\t%s\n' "$(pkgver gmt)"
  printf 'GSHHG (gmt coast -V)\t%s\n' "$GSHHG_VERSION"
  printf 'gmt-gshhg-full (Debian)\t%s\n' "$(pkgver gmt-gshhg-full)"
  printf 'gmt-gshhg-low (Debian)\t%s\n' "$(pkgver gmt-gshhg-low)"
  printf 'python3\t%s\n' "$("$PY" -c 'import platform; print(platform.python_version())')"
  printf 'shapely / GEOS\t%s\n' "$("$PY" -c 'import shapely, shapely.geos as g; print(shapely.__version__, "/", g.geos_version_string)')"
  printf 'python3-shapely (Debian)\t%s\n' "$(pkgver python3-shapely)"
  printf 'node\t%s\n' "$(node --version 2>/dev/null || echo unknown)"
  printf 'npm\t%s\n' "$(npm --version)"
  printf 'world-atlas (npm)\t%s\n' "$WORLD_ATLAS_VERSION"
  printf 'world-atlas dist.integrity\t%s\n' "$INTEGRITY"
  printf 'Natural Earth (per world-atlas README)\t%s\n' \
    "$(grep -o 'version [0-9.]*[0-9]' "$WORK/npm/node_modules/world-atlas/README.md" | head -1 | cut -d' ' -f2)"
  printf 'land-10m.json sha256\t%s\n' "$TOPO_SHA"
} > "$VERSIONS"
{
  echo "# Tools and data that made the files in test-charts/ (written by make-charts.sh)"
  column -t -s $'\t' "$VERSIONS" 2>/dev/null || cat "$VERSIONS"
} > "$HERE/VERSIONS.txt"

# Provenance table copied into each bundled GeoPackage (an attributes table 'provenance').
PROV="$WORK/provenance.csv"
prov() {  # file-specific rows first, then the versions
  {
    echo "key,value"
    while [ $# -gt 1 ]; do printf '"%s","%s"\n' "$1" "${2//\"/\"\"}"; shift 2; done
    printf '"made by","test-charts/make-charts.sh"\n'
    tail -n +2 "$VERSIONS" | while IFS=$'\t' read -r k v; do
      printf '"%s","%s"\n' "$k" "${v//\"/\"\"}"; done
  } > "$PROV"
}
add_prov() {  # gpkg
  ogr2ogr -update -f GPKG "$1" "$PROV" -nln provenance -oo AUTODETECT_TYPE=NO
}

CHECKS="$HERE/CHECKS.txt"
echo "# Checks run by make-charts.sh (each run rewrites this file)" > "$CHECKS"

# ---- 1. world-base.gpkg --------------------------------------------------------------------
echo "== world-base.gpkg"
WORLD="$HERE/world-base.gpkg"
ogr2ogr -f GeoJSON "$WORK/ne-land.geojson" "$TOPO" land -a_srs EPSG:4326
"$PY" "$TOOL" world-split "$WORK/ne-land.geojson" "$WORK/ne-split.geojson" \
  --cell-deg "$WORLD_CELL_DEG" --simplify-deg "$WORLD_SIMPLIFY_DEG" | tee -a "$CHECKS"
rm -f "$WORLD"
ogr2ogr -f GPKG "$WORLD" "$WORK/ne-split.geojson" -nln land -nlt POLYGON -a_srs EPSG:4326 \
  -lco SPATIAL_INDEX=YES -lco FID=fid \
  -lco "DESCRIPTION=Natural Earth 1:10m land (4.1.0, world-atlas $WORLD_ATLAS_VERSION), cut on ${WORLD_CELL_DEG} deg cells" \
  -mo "SOURCE=Natural Earth 1:10m land via npm world-atlas $WORLD_ATLAS_VERSION (public domain)"
prov "content" "Natural Earth 1:10m land, cut on ${WORLD_CELL_DEG} deg cells, simplified ${WORLD_SIMPLIFY_DEG} deg" \
     "licence" "Natural Earth: public domain; world-atlas packaging: ISC" \
     "source" "npm world-atlas $WORLD_ATLAS_VERSION land-10m.json (sha256 $TOPO_SHA)"
add_prov "$WORLD"

# ---- 2. demo-region.gpkg -------------------------------------------------------------------
echo "== demo-region.gpkg"
assemble() {  # region out.gpkg label
  local region=$1 out=$2 label=$3
  gmt coast -M -W -Df -A0/0/4 -R"$region" --FORMAT_FLOAT_OUT=%.12g > "$WORK/$label-pieces.txt"
  "$PY" "$TOOL" demo-assemble "$WORK/$label-pieces.txt" --region="$region" --res f \
    --out-prefix "$WORK/$label-"
  rm -f "$out"
  ogr2ogr -f GPKG "$out" "$WORK/$label-land.geojson" -nln land -nlt POLYGON -lco FID=fid \
    -a_srs EPSG:4326 -lco "DESCRIPTION=GSHHG $GSHHG_VERSION full-resolution land, R=$region" \
    -mo "SOURCE=GSHHG $GSHHG_VERSION full resolution (Wessel and Smith, LGPL) via GMT $(gmt --version)"
  ogr2ogr -update -f GPKG "$out" "$WORK/$label-coastline.geojson" -nln coastline \
    -nlt LINESTRING -lco FID=fid -a_srs EPSG:4326 \
    -lco "DESCRIPTION=GSHHG $GSHHG_VERSION full-resolution shorelines, R=$region"
  if [ -f "$WORK/$label-lakes.geojson" ]; then
    ogr2ogr -update -f GPKG "$out" "$WORK/$label-lakes.geojson" -nln lakes -nlt POLYGON \
      -lco FID=fid -a_srs EPSG:4326 -lco "DESCRIPTION=GSHHG lakes (levels 2 and 4), R=$region"
  else
    echo "  no GSHHG lakes (level 2 or 4) in R=$region: no 'lakes' layer"
  fi
  prov "content" "GSHHG full-resolution land polygons, coastline lines, R=$region (W/E/S/N)" \
       "licence" "GSHHG: GNU LGPL (Wessel and Smith)" \
       "source" "gmt coast -M -W -Df -A0/0/4, closed with shapely polygonize, faces classified by gmt select"
  add_prov "$out"
}
DEMO="$HERE/demo-region.gpkg"
assemble "$DEMO_REGION" "$DEMO" demo | tee -a "$CHECKS"
echo "-- demo land against Natural Earth land" >> "$CHECKS"
"$PY" "$TOOL" check-demo --demo "$DEMO" --world "$WORLD" --region="$DEMO_REGION" \
  --output "$CHECKS"

echo "-- geometry read back through GDAL" >> "$CHECKS"
"$PY" "$TOOL" check-valid --output "$CHECKS" --strip-prefix "$HERE/" \
  "$WORLD:land" "$DEMO:land" "$DEMO:coastline"

# ---- 3. probe-points.tsv -------------------------------------------------------------------
echo "== probe-points.tsv"
"$PY" "$TOOL" probes --demo "$DEMO" --world "$WORLD" --region="$DEMO_REGION" \
  --output "$HERE/probe-points.tsv" --checks "$CHECKS"

# ---- 4. fixtures ---------------------------------------------------------------------------
echo "== fixtures/"
FIX="$HERE/fixtures"
mkdir -p "$FIX"
rm -f "$FIX"/*.gpkg "$FIX"/*.geojson "$FIX"/EXPECTED.tsv
# Coastlines of three islands, reprojected to Web Mercator, thinned to keep the file small.
ogr2ogr -f GPKG "$FIX/lines-3857.gpkg" "$DEMO" coastline -nln lines -lco FID=fid \
  -where "name IN ('Faial', 'Pico', 'Graciosa')" -simplify 0.001 -t_srs EPSG:3857
ogr2ogr -f GeoJSON "$FIX/points.geojson" "$HERE/probe-points.tsv" -nln points \
  -oo X_POSSIBLE_NAMES=lon -oo Y_POSSIBLE_NAMES=lat -oo AUTODETECT_TYPE=YES -a_srs EPSG:4326 \
  -lco RFC7946=YES
ogr2ogr -f GPKG "$FIX/empty-layer.gpkg" "$DEMO" land -nln empty -where "1 = 0" -lco FID=fid
# A valid GeoPackage cut in half: the reader must fail cleanly, not crash or hang.
ogr2ogr -f GPKG "$WORK/whole.gpkg" "$DEMO" land -nln land -where "name IS NOT NULL" -lco FID=fid
head -c $(( $(stat -c %s "$WORK/whole.gpkg") / 2 )) "$WORK/whole.gpkg" > "$FIX/truncated.gpkg"
printf 'This is a text file named .gpkg, not a GeoPackage (a test fixture).\n' \
  > "$FIX/not-a-gpkg.gpkg"
# Invented features (not real places' shapes): a good polygon, a polygon whose ring has only
# two points (invalid: a ring needs at least four positions), and a good point.
cat > "$WORK/broken.csv" <<'CSV'
id,label,WKT
1,good square,"POLYGON ((-27.0 38.0,-26.9 38.0,-26.9 38.1,-27.0 38.1,-27.0 38.0))"
2,ring of two points,"POLYGON ((-26.5 38.0,-26.4 38.1))"
3,good point,"POINT (-26.0 38.5)"
CSV
ogr2ogr -f GeoJSON "$FIX/broken-geometry.geojson" "$WORK/broken.csv" -nln broken \
  -oo GEOM_POSSIBLE_NAMES=WKT -oo KEEP_GEOM_COLUMNS=NO -a_srs EPSG:4326 2>/dev/null
grep -q '\[ \[ \[ -26.5, 38.0 \], \[ -26.4, 38.1 \] \] \]' "$FIX/broken-geometry.geojson" ||
  { echo "FAIL: broken-geometry.geojson lacks its two-point ring" >&2; exit 1; }
"$PY" "$TOOL" expected --output "$FIX/EXPECTED.tsv" --strip-prefix "$HERE/" \
  "$WORLD" "$DEMO" "$FIX/lines-3857.gpkg" "$FIX/points.geojson" "$FIX/empty-layer.gpkg"
{
  echo "-- what GDAL says about the bad fixtures"
  for f in truncated.gpkg not-a-gpkg.gpkg broken-geometry.geojson; do
    msg=$(ogrinfo -ro -al -so "$FIX/$f" 2>&1 | grep -E 'ERROR|FAILURE|Warning|Feature Count' |
          head -3 | tr '\n' ' ' || true)
    echo "$f: ${msg:-no message}"
  done
} | sed "s#$HERE/##g" >> "$CHECKS"

# ---- 5. benchmark set (not committed) ------------------------------------------------------
if [ "$BENCH" -eq 1 ]; then
  echo "== build/bench-atlantic.gpkg (R=$BENCH_REGION)"
  mkdir -p "$HERE/build"
  start=$(date +%s)
  assemble "$BENCH_REGION" "$HERE/build/bench-atlantic.gpkg" bench
  echo "bench set made in $(( $(date +%s) - start )) s"
  ogrinfo -ro -al -so "$HERE/build/bench-atlantic.gpkg" | grep -E '^(Layer name|Feature Count)'
fi

echo "== sizes"
du -b "$WORLD" "$DEMO" "$HERE/probe-points.tsv" "$FIX"/* | sed "s#$HERE/##"
echo "done: see $HERE/CHECKS.txt"
