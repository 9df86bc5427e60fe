#!/usr/bin/python3
"""Writes topocentric-swetest.tsv: topocentric apparent altitude and true azimuth of Sun, Moon,
Venus, Mars, Jupiter, Saturn and 10 navigational stars from swetest, for random observers at
random UTC instants 2000-2040.

Usage: /usr/bin/python3 reference/topocentric_swetest.py [OUTDIR]
"""
import datetime
import os
import random
import re
import shlex
import sys

sys.path.insert(0, os.path.dirname(os.path.abspath(__file__)))
import swe_common as S  # noqa: E402

SEED = 20002040
N_CASES = 500
T_START = datetime.datetime(2000, 1, 1)
T_END = datetime.datetime(2041, 1, 1)   # exclusive: 2000-01-01 .. 2040-12-31 UTC
PLANETS = "013456"
PLANET_NAMES = {"Sun": "SUN", "Moon": "MOON", "Venus": "VENUS", "Mars": "MARS",
                "Jupiter": "JUPITER", "Saturn": "SATURN"}
# 10 navigational stars spread over the sky: (trade number, name, swetest nomenclature)
STARS = [(18, "Sirius", "alCMa"), (17, "Canopus", "alCar"), (37, "Arcturus", "alBoo"),
         (49, "Vega", "alLyr"), (12, "Capella", "alAur"), (38, "Rigil Kentaurus", "alCen"),
         (0, "Polaris", "alUMi"), (5, "Achernar", "alEri"), (42, "Antares", "alSco"),
         (56, "Fomalhaut", "alPsA")]
ATM = "-at1010,10,0,0"   # pressure 1010 hPa, 10 C (the almanac's standard refraction conditions)


def parse(out, what):
    ut = re.search(r"UT:\s+([\d.]+)\s+delta t:\s+(-?[\d.]+) sec", out)
    tt = re.search(r"TT:\s+([\d.]+)", out)
    if not ut or not tt:
        S.fail("no UT/TT header in swetest output for %s" % what)
    data = [[f.strip() for f in ln.split("|")] for ln in out.splitlines()
            if "|" in ln and not ln.startswith(("Epsilon", "Nutation", "swetest"))]
    return ut.group(1), ut.group(2), tt.group(1), data


def main():
    outdir = sys.argv[1] if len(sys.argv) > 1 else os.path.join(
        os.path.dirname(os.path.abspath(__file__)), "..", "plugin", "src", "test", "resources",
        "reference")
    S.ensure_swetest()
    rng = random.Random(SEED)
    span = int((T_END - T_START).total_seconds())
    rows = []
    example = None
    for case in range(1, N_CASES + 1):
        lat = round(rng.uniform(-70.0, 70.0), 6)
        lon = round(rng.uniform(-180.0, 180.0), 6)
        t = T_START + datetime.timedelta(seconds=rng.randrange(span))
        pos = "%.6f,%.6f,0" % (lon, lat)
        base = [S.EDIR, "-b%d.%d.%d" % (t.day, t.month, t.year),
                "-utc%02d:%02d:%02d" % (t.hour, t.minute, t.second),
                "-topo" + pos, "-geopos" + pos, ATM, "-fPadihk", "-ep", "-g|"]
        runs = [(base[:1] + ["-p" + PLANETS] + base[1:], None)]
        for num, name, nom in STARS:
            runs.append((base[:1] + ["-pf", "-xf," + nom] + base[1:], (num, name, nom)))
        if example is None:
            example = [shlex.join(a) for a, _ in runs[:2]]
        utc = t.strftime("%Y-%m-%dT%H:%M:%SZ")
        for args, star in runs:
            out = S.run(args)
            jd_ut1, dt_s, jd_tt, data = parse(out, utc)
            for f in data:
                if star is None:
                    body = PLANET_NAMES[f[0]]
                else:
                    if not f[0].endswith("," + star[2]):
                        S.fail("swetest answered %r for ,%s" % (f[0], star[2]))
                    body = "STAR%d" % star[0]
                az_s = float(f[3])
                zn = (az_s + 180.0) % 360.0
                rows.append((str(case), utc, jd_ut1, jd_tt, dt_s, "%.6f" % lat, "%.6f" % lon,
                             "0", body, f[1], f[2], f[4], f[5], "%.7f" % zn, f[3]))
    header = [
        "topocentric-swetest.tsv: topocentric apparent altitude and azimuth from swetest.",
        "Written by reference/topocentric_swetest.py; do not edit by hand "
        "(reference/check-all.sh regenerates and compares).",
        S.versions_line(),
        S.ephemeris_check(),
        "random cases: Python random.Random(%d), %d cases: lat uniform in [-70, 70) deg, lon "
        "uniform in [-180, 180) deg (both rounded to 1e-6 deg), height 0 m, UTC instant uniform "
        "over whole seconds 2000-01-01T00:00:00Z .. 2040-12-31T23:59:59Z; each case has the 6 "
        "bodies and 10 stars (all of them, below the horizon too)" % (SEED, N_CASES),
        "stars: " + ", ".join("STAR%d = %s (-xf,%s)" % s for s in STARS) + " (trade numbers)",
        "command per case (planets, then once per star with -pf -xf,<nomenclature> instead of "
        "-p%s), first case:" % PLANETS,
        "  swetest " + example[0],
        "  swetest " + example[1],
        "time: swetest takes the instant as UTC (-b<d.m.y> -utc<h:m:s>), converts to TT with its "
        "leap-second table (TT = UTC + 32.184 s + (TAI-UTC)) and to UT1 = TT - Delta T by its "
        "own Delta T model (not IERS DUT1, so jd_ut1 - UTC can exceed 0.9 s); the altitude and "
        "azimuth use jd_ut1 for the Earth's rotation (sidereal time) and jd_tt for the "
        "ephemeris. A test should feed jd_tt and jd_ut1 from this table to match time scales.",
        "place: -topo and -geopos both lon,lat,height (east and north positive), geodetic on "
        "swetest's Earth ellipsoid (a = 6378136.6 m, 1/f = 298.25642, IERS 2003 values; from "
        "memory of the Swiss Ephemeris documentation; WGS84 differs by < 1 m); no polar motion",
        "refraction: alt_deg has none; alt_refr_deg is swetest's refracted (apparent) altitude "
        "with %s = 1010 hPa and 10 C (swe_azalt); swetest refracts only where the refracted "
        "altitude is >= 0 (seen in this table: true altitudes down to about -0.57 deg are "
        "lifted to >= 0, lower ones are printed unrefracted, alt_refr_deg = alt_deg)" % ATM,
        "azimuth: swetest prints azimuth from SOUTH, clockwise through west (south 0, west 90); "
        "zn_deg = (swe_az_deg + 180) mod 360 = true azimuth from north, clockwise through east",
        "columns:",
        "  case            case number 1..%d (same observer and instant on all its rows)" % N_CASES,
        "  utc             the instant, ISO 8601 UTC (the input)",
        "  jd_ut1          UT1 as swetest used it, Julian Date",
        "  jd_tt           TT as swetest used it, Julian Date",
        "  delta_t_s       swetest's Delta T = TT - UT1, seconds",
        "  lat_deg lon_deg height_m  observer, geodetic degrees (north, east positive), metres",
        "  body            SUN MOON VENUS MARS JUPITER SATURN or STAR<trade number>",
        "  ra_topo_deg dec_topo_deg  topocentric apparent RA and Dec of date (true equator and "
        "equinox), degrees",
        "  alt_deg         topocentric altitude of the centre, no refraction, degrees",
        "  alt_refr_deg    the same with refraction (%s), degrees" % ATM,
        "  zn_deg          true azimuth from north, clockwise, degrees [0,360)",
        "  swe_az_deg      swetest's azimuth as printed (from south, clockwise), degrees",
    ]
    cols = ["case", "utc", "jd_ut1", "jd_tt", "delta_t_s", "lat_deg", "lon_deg", "height_m",
            "body", "ra_topo_deg", "dec_topo_deg", "alt_deg", "alt_refr_deg", "zn_deg",
            "swe_az_deg"]
    S.write_table(os.path.join(outdir, "topocentric-swetest.tsv"), header, cols, rows)


if __name__ == "__main__":
    main()
