#!/usr/bin/python3
"""Writes almanac-swetest.tsv: apparent geocentric places of Sun, Moon, Venus, Mars, Jupiter and
Saturn from swetest at random instants 1950-2050 (TT).

Usage: /usr/bin/python3 reference/almanac_swetest.py [OUTDIR]
"""
import os
import random
import sys

sys.path.insert(0, os.path.dirname(os.path.abspath(__file__)))
import swe_common as S  # noqa: E402

SEED = 19500101
N_INSTANTS = 2000
JD_START = 2433282.5   # 1950-01-01 00:00 TT
JD_END = 2470172.5     # 2051-01-01 00:00 TT (end of 2050-12-31)
BODIES = "035461"      # swetest body letters: Sun, Venus, Jupiter, Saturn, Mars, Moon
NAMES = {"Sun": "SUN", "Moon": "MOON", "Venus": "VENUS", "Mars": "MARS",
         "Jupiter": "JUPITER", "Saturn": "SATURN"}


def main():
    outdir = sys.argv[1] if len(sys.argv) > 1 else os.path.join(
        os.path.dirname(os.path.abspath(__file__)), "..", "plugin", "src", "test", "resources",
        "reference")
    S.ensure_swetest()
    rng = random.Random(SEED)
    jds = sorted("%.6f" % (JD_START + (JD_END - JD_START) * rng.random())
                 for _ in range(N_INSTANTS))
    pos_args = [S.EDIR, "-p" + BODIES, "-fPadR/=", "-ep"]
    dt_args = [S.EDIR, "-pq", "-fPl", "-ep"]
    true_args = [S.EDIR, "-p" + BODIES, "-fPR", "-ep", "-true"]
    pos = S.run_dates(pos_args, jds)
    tru = S.run_dates(true_args, jds)
    dts = S.run_dates(dt_args, jds)
    rows = []
    for jd, answer, dt, tr in zip(jds, pos, dts, tru):
        if dt[0][0] != "Delta T":
            S.fail("unexpected delta T line %r" % dt)
        dt_s = float(dt[0][1])
        jd_ut = float(jd) - dt_s / 86400.0
        for f, g in zip(answer, tr):
            if f[0] != g[0]:
                S.fail("body order differs at %s: %s / %s" % (jd, f[0], g[0]))
            name = NAMES[f[0]]
            rows.append((name, jd, "%.9f" % jd_ut, "%.6f" % dt_s, f[1], f[2], f[3], g[1],
                         "%.8f" % (S.dms_to_deg(f[4]) * 3600.0), S.mag(f[5])))
    order = {n: i for i, n in enumerate(["SUN", "MOON", "VENUS", "MARS", "JUPITER", "SATURN"])}
    rows.sort(key=lambda r: (order[r[0]], r[1]))
    header = [
        "almanac-swetest.tsv: apparent geocentric places from swetest (Swiss Ephemeris).",
        "Written by reference/almanac_swetest.py; do not edit by hand (reference/check-all.sh "
        "regenerates and compares).",
        S.versions_line(),
        S.ephemeris_check(),
        "random instants: Python random.Random(%d), %d instants uniform in JD TT [%.1f, %.1f) "
        "(1950-01-01 0h TT .. 2051-01-01 0h TT), rounded to 1e-6 day; every body at every "
        "instant" % (SEED, N_INSTANTS, JD_START, JD_END),
        "command (positions): swetest %s -head -g'|'   with standard input one line "
        "'j<jd_tt>' per instant, then '.' (interactive mode; %d instants per run)"
        % (" ".join(pos_args), S.CHUNK),
        "command (Delta T):   swetest %s -head -g'|'   same standard input" % " ".join(dt_args),
        "command (true dist): swetest %s -head -g'|'   same standard input" % " ".join(true_args),
        "swetest reads a bare JD as TT (ephemeris time): no UT1 or Delta T model enters the "
        "positions.",
        "default swetest flags = apparent place: light time, annual aberration, gravitational "
        "deflection, precession and nutation to the true equator and equinox of date (Swiss "
        "Ephemeris 2.10 defaults, from memory of its documentation: Vondrak 2011 precession, "
        "IAU 2000B nutation).",
        "columns:",
        "  body            SUN MOON VENUS MARS JUPITER SATURN",
        "  jd_tt           instant, Julian Date, Terrestrial Time (the input)",
        "  jd_ut           jd_tt - delta_t_s/86400: UT1 by swetest's own Delta T (its built-in "
        "table, extrapolated beyond it); for information only",
        "  delta_t_s       swetest's Delta T = TT - UT1 at the instant, seconds",
        "  ra_deg          apparent geocentric right ascension of date, degrees [0,360)",
        "  dec_deg         apparent geocentric declination of date, degrees",
        "  dist_au         distance as swetest gives it with the apparent place: body at the "
        "time of emission to the Earth at jd_tt, au (1 au = 149597870.700 km); for the Moon "
        "this differs from the geometric distance by up to about 35 km (Earth's motion during "
        "the light time)",
        "  dist_true_au    geometric (true) geocentric distance at jd_tt (flag -true: no light "
        "time, no aberration), au: use this one for horizontal parallax",
        "  diam_arcsec     apparent diameter of the disc, arcseconds (swetest '/', no refraction; "
        "for the planets the body's diameter as swetest models it, Saturn without rings); "
        "semi-diameter = half",
        "  mag             visual magnitude as swetest prints it (3 decimals)",
    ]
    cols = ["body", "jd_tt", "jd_ut", "delta_t_s", "ra_deg", "dec_deg", "dist_au", "dist_true_au",
            "diam_arcsec", "mag"]
    S.write_table(os.path.join(outdir, "almanac-swetest.tsv"), header, cols, rows)


if __name__ == "__main__":
    main()
