#!/usr/bin/python3
"""Writes stars-swetest.tsv: apparent geocentric places of the 58 navigational stars from
swetest's fixed-star file at random instants 1950-2050 (TT), with the catalogue place it used.

Usage: /usr/bin/python3 reference/stars_swetest.py [OUTDIR] [STARS_TSV] [BSC5_DAT]
"""
import math
import os
import random
import sys

sys.path.insert(0, os.path.dirname(os.path.abspath(__file__)))
import swe_common as S  # noqa: E402

SEED = 58195001
PER_STAR = 35          # 58 x 35 = 2030 (star, instant) pairs
JD_START = 2433282.5   # 1950-01-01 00:00 TT
JD_END = 2470172.5     # 2051-01-01 00:00 TT
GREEK = {"Alp": "al", "Bet": "be", "Gam": "ga", "Del": "de", "Eps": "ep", "Zet": "ze",
         "Eta": "et", "The": "th", "Iot": "io", "Kap": "ka", "Lam": "la", "Mu": "mu",
         "Nu": "nu", "Xi": "xi", "Omi": "omi", "Pi": "pi", "Rho": "rh", "Sig": "si",
         "Tau": "ta", "Ups": "up", "Phi": "ph", "Chi": "ch", "Psi": "ps", "Ome": "om"}
# Where the trade's star is one component, swetest's file names the component (checked by eye in
# the file and by the position check below): Acamar = The1 Eri, Zubenelgenubi = Alp2 Lib.
COMPONENT = {"Acamar": "th-1Eri", "Zubenelgenubi": "al-2Lib"}
MAG_TOL = 0.25         # swetest magnitude vs BSC V: a different photometry, not a different star
POS_TOL_ARCMIN = 0.5   # J2000 catalogue place vs BSC J2000 place: same star
# Acrux: swetest's entry is the combined light of the pair (0.81), BSC HR 4730 is Alp1 Cru (1.33)
MAG_TOL_COMBINED = {"Acrux": 0.6}


def nomenclature(name, bayer):
    if name in COMPONENT:
        return COMPONENT[name]
    g, con = bayer.split()
    return GREEK[g] + con


def read_stars(path):
    stars = []
    with open(path, encoding="utf-8") as f:
        for n, line in enumerate(f, 1):
            if line.startswith("#") or not line.strip():
                continue
            p = line.rstrip("\n").split("\t")
            if len(p) != 4:
                S.fail("%s line %d: expected 4 tab-separated fields number, name, bayer, hr"
                       % (path, n))
            stars.append((int(p[0]), p[1], p[2], int(p[3])))
    return stars


def read_bsc(path):
    """HR -> (ra_deg, dec_deg, vmag) from the Bright Star Catalogue 5th ed., J2000 columns."""
    out = {}
    with open(path, encoding="latin-1") as f:
        for line in f:
            if len(line) < 107 or not line[75:77].strip():
                continue
            hr = int(line[0:4])
            ra = (int(line[75:77]) + int(line[77:79]) / 60 + float(line[79:83]) / 3600) * 15
            dec = int(line[84:86]) + int(line[86:88]) / 60 + int(line[88:90]) / 3600
            if line[83] == "-":
                dec = -dec
            out[hr] = (ra, dec, float(line[102:107]))
    return out


def sep_arcmin(ra1, de1, ra2, de2):
    r = math.radians
    c = (math.sin(r(de1)) * math.sin(r(de2))
         + math.cos(r(de1)) * math.cos(r(de2)) * math.cos(r(ra1 - ra2)))
    return math.degrees(math.acos(min(1.0, c))) * 60.0


def main():
    here = os.path.dirname(os.path.abspath(__file__))
    outdir = sys.argv[1] if len(sys.argv) > 1 else os.path.join(
        here, "..", "plugin", "src", "test", "resources", "reference")
    # the project's shared star data: beside the repository (as CI lays it) or at /work/shared
    shared = next((d for d in (os.path.join(here, "..", "..", "shared", "data", "stars"),
                               "/work/shared/data/stars") if os.path.isdir(d)),
                  "/work/shared/data/stars")
    stars_tsv = sys.argv[2] if len(sys.argv) > 2 else os.path.join(shared, "navigational-stars.tsv")
    bsc_path = sys.argv[3] if len(sys.argv) > 3 else os.path.join(shared, "bsc5.dat")
    for p in (stars_tsv, bsc_path):
        if not os.path.exists(p):
            S.fail("star data %s not found (give STARS_TSV and BSC5_DAT as arguments)" % p)
    S.ensure_swetest()
    stars = read_stars(stars_tsv)
    bsc = read_bsc(bsc_path)
    rng = random.Random(SEED)
    rows, checks = [], []
    app_tmpl = None
    for number, name, bayer, hr in stars:
        nom = nomenclature(name, bayer)
        jds = sorted("%.6f" % (JD_START + (JD_END - JD_START) * rng.random())
                     for _ in range(PER_STAR))
        app_args = [S.EDIR, "-pf", "-xf," + nom, "-fPad=", "-ep"]
        ast_args = [S.EDIR, "-pf", "-xf," + nom, "-fPad", "-ep", "-icrs", "-j2000",
                    "-noaberr", "-nodefl"]
        cat_args = [S.EDIR, "-pf", "-xf," + nom, "-fPad", "-ep", "-icrs", "-j2000",
                    "-noaberr", "-nodefl", "-bary"]
        app_tmpl = (app_args, ast_args, cat_args)
        app = S.run_dates(app_args, jds)
        ast = S.run_dates(ast_args, jds)
        cat = S.run_dates(cat_args, ["2451545.000000"])[0][0]
        swe_name = cat[0]
        if not swe_name.endswith("," + nom):
            S.fail("%s: swetest answered %r for ,%s" % (name, swe_name, nom))
        cat_ra, cat_dec = float(cat[1]), float(cat[2])
        b_ra, b_dec, b_mag = bsc[hr]
        d = sep_arcmin(cat_ra, cat_dec, b_ra, b_dec)
        smag = float(S.mag(app[0][0][3]))
        if d > POS_TOL_ARCMIN or abs(smag - b_mag) > MAG_TOL_COMBINED.get(name, MAG_TOL):
            S.fail("%s (HR %d): swetest %s is %.3f' from BSC, mag %.2f vs %.2f"
                   % (name, hr, swe_name, d, smag, b_mag))
        checks.append((number, name, hr, swe_name, d, smag, b_mag))
        for jd, a, s in zip(jds, app, ast):
            rows.append((str(number), name, swe_name, str(hr), jd, a[0][1], a[0][2],
                         S.mag(a[0][3]), s[0][1], s[0][2], cat[1], cat[2]))
    by = {c[1]: c for c in checks}
    worst = max(checks, key=lambda c: c[4])
    app_args, ast_args, cat_args = app_tmpl
    header = [
        "stars-swetest.tsv: apparent geocentric places of the 58 navigational stars from swetest.",
        "Written by reference/stars_swetest.py; do not edit by hand (reference/check-all.sh "
        "regenerates and compares).",
        S.versions_line(),
        S.ephemeris_check(),
        "star list: navigational-stars.tsv (trade numbers 1-57, Polaris = 0; names, Bayer, HR), "
        "copied from the project's shared star data",
        "star catalogue in swetest's file sefstars.txt (swe-basic-data): SIMBAD values, mostly "
        "the Hipparcos new reduction (van Leeuwen 2007), ICRS, epoch J2000.0, with proper "
        "motion, parallax and radial velocity (file header: 'updated with data from the SIMBAD "
        "Astronomical Database', last 2018)",
        "swetest catalogue place vs Bright Star Catalogue 5th ed. J2000 place (bsc5.dat): "
        "Sirius %.4f' (%.2f\"), Polaris %.4f' (%.2f\"), largest %s %.4f'; magnitudes within %.2f of BSC V (Acrux: file %.2f for the pair, BSC %.2f for Alp1 Cru)"
        % (by["Sirius"][4], by["Sirius"][4] * 60, by["Polaris"][4], by["Polaris"][4] * 60,
           worst[1], worst[4], max(abs(c[5] - c[6]) for c in checks if c[1] != "Acrux"),
           by["Acrux"][5], by["Acrux"][6]),
        "star naming: looked up by Bayer nomenclature, swetest -xf,<greek><Con> (e.g. -xf,alCMa; "
        "Acamar -xf,th-1Eri; Zubenelgenubi -xf,al-2Lib; Menkar -xf,alCet, not the lambda Cet "
        "that shares the name in the file); each answer's name checked against the nomenclature, "
        "its magnitude against BSC V within %.2f and its catalogue place within %.1f' of BSC"
        % (MAG_TOL, POS_TOL_ARCMIN),
        "Rigil Kentaurus (-xf,alCen) and Acrux (-xf,alCru) are the file's combined entries for "
        "the pair, not the A component; their BSC offsets are in the check above",
        "random pairs: Python random.Random(%d), %d instants per star uniform in JD TT "
        "[%.1f, %.1f) (1950-01-01 .. 2051-01-01 0h TT), rounded to 1e-6 day"
        % (SEED, PER_STAR, JD_START, JD_END),
        "command (apparent, per star):   swetest %s -head -g'|'   with standard input one line "
        "'j<jd_tt>' per instant, then '.'" % " ".join(app_args),
        "command (astrometric):          swetest %s -head -g'|'   same standard input"
        % " ".join(ast_args),
        "command (catalogue, J2000.0):   swetest %s -head -g'|'   standard input 'j2451545.0'"
        % " ".join(cat_args),
        "(the star shown above is the last in the list; the others differ only in -xf)",
        "columns:",
        "  number          trade number (0 = Polaris)",
        "  name            trade name",
        "  swe_name        name,nomenclature as swetest printed it",
        "  hr              Bright Star Catalogue number",
        "  jd_tt           instant, Julian Date, Terrestrial Time (swetest reads a bare JD as TT)",
        "  ra_deg dec_deg  apparent geocentric RA and Dec of date (proper motion, parallax, light "
        "deflection, annual aberration, precession-nutation to true equator and equinox of date), "
        "degrees",
        "  mag             swetest's V magnitude (from its catalogue)",
        "  ra_astrom_deg dec_astrom_deg  astrometric geocentric place at jd_tt: ICRS/J2000 axes, "
        "proper motion and annual parallax applied, no aberration, no deflection, no "
        "precession-nutation (flags -icrs -j2000 -noaberr -nodefl), degrees",
        "  ra_cat_deg dec_cat_deg  the catalogue place swetest used: barycentric astrometric at "
        "J2000.0 (flags -icrs -j2000 -noaberr -nodefl -bary at JD 2451545.0), degrees; equals "
        "the catalogue RA/Dec of the file",
    ]
    cols = ["number", "name", "swe_name", "hr", "jd_tt", "ra_deg", "dec_deg", "mag",
            "ra_astrom_deg", "dec_astrom_deg", "ra_cat_deg", "dec_cat_deg"]
    S.write_table(os.path.join(outdir, "stars-swetest.tsv"), header, cols, rows)
    for c in checks:
        print("%2d %-16s HR%-5d %-22s %.4f' mag %.2f BSC %.2f" % c)


if __name__ == "__main__":
    main()
