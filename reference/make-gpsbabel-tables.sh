#!/usr/bin/env bash
# Writes the gpsbabel reference table for the NMEA 0183 reader's test (GpsbabelReferenceTest):
#   geo/src/test/resources/reference/gpsbabel-input.nmea   a seeded NMEA log (GGA, GLL, RMC, VTG in that order within each second,
#       talkers GP/GN/GL, a midnight, GGA before the first RMC, a few lines with a wrong checksum)
#   geo/src/test/resources/reference/gpsbabel-track.csv    what gpsbabel makes of it (via GPX):
#       time_utc,lat_deg,lon_deg of every track point, with the gpsbabel version in the header
# Needs: gpsbabel (Debian), /usr/bin/python3. Run from anywhere; the output is committed.
set -euo pipefail
cd "$(dirname "$0")/.."
if ! command -v gpsbabel >/dev/null; then
  apt-get update -qq && DEBIAN_FRONTEND=noninteractive apt-get install -y -qq gpsbabel
fi
out=geo/src/test/resources/reference
mkdir -p "$out"
/usr/bin/python3 - "$out/gpsbabel-input.nmea" <<'PY'
import random, sys, datetime
rnd = random.Random(20260621)
def cs(body):
    x = 0
    for ch in body: x ^= ord(ch)
    return "$%s*%02X" % (body, x)
def dm(v, w, pos, neg):
    a = abs(v); d = int(a); return ("%0*d%07.4f" % (w, d, (a - d) * 60), pos if v >= 0 else neg)
t = datetime.datetime(2026, 6, 21, 23, 50, 0, tzinfo=datetime.timezone.utc)
lat, lon = 38.53, -28.63
lines = []
for i in range(1200):
    lat += rnd.uniform(-1e-4, 1e-4) - 2e-5
    lon += rnd.uniform(-1e-4, 1e-4) + 4e-5
    hms = t.strftime("%H%M%S") + ".00"
    la, lh = dm(lat, 2, "N", "S"); lo, lo_h = dm(lon, 3, "E", "W")
    talker = rnd.choice(["GP", "GN", "GL"])
    gga = cs("%sGGA,%s,%s,%s,%s,%s,1,09,0.9,4.0,M,52.0,M,," % (talker, hms, la, lh, lo, lo_h))
    rmc = cs("%sRMC,%s,A,%s,%s,%s,%s,6.1,105.2,%s,,,A" % (talker, hms, la, lh, lo, lo_h, t.strftime("%d%m%y")))
    vtg = cs("%sVTG,105.2,T,,M,6.1,N,11.3,K,A" % talker)
    if i < 5:
        lines.append(gga)                      # GGA before the first date
    elif i % 7 == 0:
        lines.append(gga)
        lines.append(cs("%sGLL,%s,%s,%s,%s,%s,A,A" % (talker, la, lh, lo, lo_h, hms)))
        lines.append(rmc)
    else:
        lines.append(gga); lines.append(rmc); lines.append(vtg)
    if i % 97 == 50:                            # a wrong checksum: both readers must drop it
        bad = cs("%sGGA,%s,%s,%s,%s,%s,1,09,0.9,4.0,M,52.0,M,," % (talker, (t + datetime.timedelta(milliseconds=500)).strftime("%H%M%S") + ".50", la, lh, lo, lo_h))
        lines.append(bad[:-2] + ("00" if bad[-2:] != "00" else "01"))
    t += datetime.timedelta(seconds=1)
open(sys.argv[1], "w", newline="\r\n").write("\n".join(lines) + "\n")
PY
tmp=$(mktemp -d); trap 'rm -rf "$tmp"' EXIT
gpsbabel -t -i nmea -f "$out/gpsbabel-input.nmea" -o gpx -F "$tmp/out.gpx"
ver=$(gpsbabel -V 2>&1 | grep -o 'Version [0-9.]*' | head -1)
/usr/bin/python3 - "$tmp/out.gpx" "$out/gpsbabel-track.csv" "$ver" <<'PY'
import sys, xml.etree.ElementTree as ET
ns = {"g": "http://www.topografix.com/GPX/1/0"}
root = ET.parse(sys.argv[1]).getroot()
uri = root.tag[1:].split("}")[0]; ns = {"g": uri}
with open(sys.argv[2], "w") as f:
    f.write("# gpsbabel %s: gpsbabel -t -i nmea -f gpsbabel-input.nmea -o gpx; every trkpt (written by reference/make-gpsbabel-tables.sh)\n" % sys.argv[3])
    f.write("time_utc,lat_deg,lon_deg\n")
    for p in root.iterfind(".//g:trkpt", ns):
        f.write("%s,%s,%s\n" % (p.find("g:time", ns).text, p.get("lat"), p.get("lon")))
PY
wc -l "$out/gpsbabel-track.csv"
