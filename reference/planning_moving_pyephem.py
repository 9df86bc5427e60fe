#!/usr/bin/python3
"""Writes planning-moving-pyephem.tsv: the day's times at a DR that moves with the ship (constant
course and speed, rhumb line from the DR at the zone day's start), from PyEphem, each iterated
for the ship's run: the event is searched for an observer at the DR of the previous estimate,
until two estimates agree to 0.2 s.

Usage: /usr/bin/python3 reference/planning_moving_pyephem.py [OUTDIR]
"""
import datetime
import math
import os
import random
import sys


# The PyEphem install, the nautical zone and the ISO time format are those of the fixed-place table.
from planning_pyephem import ensure_ephem, iso, zone_hours  # noqa: E402

ensure_ephem()
import ephem  # noqa: E402

SEED = 18520101
N_RANDOM = 40
D_START = datetime.date(2000, 1, 1)
D_END = datetime.date(2040, 12, 31)
# Invented passages (label, lat, lon, course deg, speed kn, zone date): across the date line both
# ways, a fast run north in high latitude, and one on the equator.
NAMED = [
    ("eastbound across the date line", -17.0, 178.0, 90.0, 25.0, "2024-03-01"),
    ("westbound across the date line", 10.0, -178.5, 270.0, 22.0, "2025-07-14"),
    ("fast north in 55N", 55.0, -20.0, 0.0, 30.0, "2026-05-10"),
    ("equator running west", 0.0, -30.0, 270.0, 20.0, "2024-03-20"),
]
NM_PER_RAD = 60.0 * 180.0 / math.pi
EVENTS = [  # (column, body, horizon, use_center, kind)
    ("sunrise", "sun", "-0:34", False, "rise"),
    ("sunset", "sun", "-0:34", False, "set"),
    ("civil_dawn", "sun", "-6", True, "rise"),
    ("civil_dusk", "sun", "-6", True, "set"),
    ("nautical_dawn", "sun", "-12", True, "rise"),
    ("nautical_dusk", "sun", "-12", True, "set"),
    ("sun_transit", "sun", "0", True, "transit"),
    ("moonrise", "moon", "-0:34", False, "rise"),
    ("moonset", "moon", "-0:34", False, "set"),
]



def rhumb(lat, lon, course, dist_nm):
    """Mercator sailing on the sphere of 1 nm per arcminute (Bowditch Pub. 9, ch. 24)."""
    c = math.radians(course)
    d = dist_nm / NM_PER_RAD
    p1 = math.radians(lat)
    p2 = p1 + d * math.cos(c)
    dpsi = math.log(math.tan(math.pi / 4 + p2 / 2) / math.tan(math.pi / 4 + p1 / 2))
    q = (p2 - p1) / dpsi if abs(dpsi) > 1e-12 else math.cos(p1)
    l2 = math.radians(lon) + d * math.sin(c) / q
    l2 = (l2 + math.pi) % (2 * math.pi) - math.pi
    return math.degrees(p2), math.degrees(l2)



def event_at(lat, lon, name, horizon, center, kind, start):
    obs = ephem.Observer()
    obs.lat, obs.lon = repr(lat), repr(lon)
    obs.elevation, obs.pressure, obs.temp = 0.0, 0.0, 10.0
    obs.horizon = horizon
    obs.date = start
    body = ephem.Sun() if name == "sun" else ephem.Moon()
    if kind == "transit":
        return obs.next_transit(body)
    fn = obs.next_rising if kind == "rise" else obs.next_setting
    try:
        return fn(body, use_center=center)
    except (ephem.AlwaysUpError, ephem.NeverUpError):
        return None


def one(lat, lon, course, speed, date_text):
    zh = zone_hours(lon)
    y, m, d = (int(x) for x in date_text.split("-"))
    start = ephem.Date(datetime.datetime(y, m, d) - datetime.timedelta(hours=zh))
    end = ephem.Date(start + 1.0)
    cells = []
    for col, name, hz, center, kind in EVENTS:
        t = event_at(lat, lon, name, hz, center, kind, start)
        for _ in range(20):
            if t is None:
                break
            la, lo = rhumb(lat, lon, course, speed * (t - start) * 24.0)
            t2 = event_at(la, lo, name, hz, center, kind, start)
            if t2 is not None and abs(t2 - t) * 86400.0 < 0.2:
                t = t2
                break
            t = t2
        cells.append(iso(t) if t is not None and start <= t < end else "")
    return [date_text, str(zh), iso(start), iso(end)] + cells


def main():
    outdir = sys.argv[1] if len(sys.argv) > 1 else os.path.join(
        os.path.dirname(os.path.abspath(__file__)), "..", "plugin", "src", "test", "resources", "reference")
    rng = random.Random(SEED)
    ndays = (D_END - D_START).days + 1
    cases = []
    for _ in range(N_RANDOM):
        cases.append(("random", round(rng.uniform(-60.0, 60.0), 4), round(rng.uniform(-180.0, 180.0), 4),
                      round(rng.uniform(0.0, 360.0), 1) % 360.0, round(rng.uniform(5.0, 30.0), 1),
                      (D_START + datetime.timedelta(days=rng.randrange(ndays))).isoformat()))
    cases.extend(NAMED)
    head = [
        "# planning-moving-pyephem.tsv: the day's times at a DR moving with the ship, from PyEphem, iterated for the ship's run.",
        "# Written by reference/planning_moving_pyephem.py; do not edit by hand.",
        "# tools: PyEphem %s (Debian python3-ephem), /usr/bin/python3 %s" % (ephem.__version__, sys.version.split()[0]),
        "# command: /usr/bin/python3 reference/planning_moving_pyephem.py [OUTDIR]",
        "# cases: %d random (Python random.Random(%d): lat uniform [-60, 60), lon uniform [-180, 180) rounded to 1e-4 deg,"
        " course uniform [0, 360) to 0.1 deg, speed uniform [5, 30) kn to 0.1 kn, zone date uniform 2000-01-01..2040-12-31),"
        " then %d named invented passages (label column)" % (N_RANDOM, SEED, len(NAMED)),
        "# the ship: at (lat_deg, lon_deg) at day_start_utc, then constant course_deg and speed_kn; the DR at each instant by"
        " Mercator sailing on the sphere of 1 nm per arcminute (Bowditch Pub. 9, ch. 24); longitude wrapped to [-180, 180)",
        "# the day: the zone day of the start DR, zone_h = floor(lon/15 + 0.5), as in planning-pyephem.tsv; an event is listed"
        " when it falls in [day_start_utc, day_end_utc)",
        "# iteration: t0 = the event for an observer at the start DR; then t(k+1) = the event (searched from day_start_utc)"
        " for an observer fixed at the DR of t(k), until |t(k+1) - t(k)| < 0.2 s",
        "# PyEphem settings and horizons as planning-pyephem.tsv: elevation 0, pressure 0; Sun and Moon upper limb at"
        " -0:34; twilight centre at -6 and -12; transit = next_transit(Sun)",
        "# columns: case label lat_deg lon_deg course_deg speed_kn date zone_h day_start_utc day_end_utc, then the events"
        " (ISO 8601 UTC, to the second; empty: none that day)",
    ]
    cols = ["case", "label", "lat_deg", "lon_deg", "course_deg", "speed_kn", "date", "zone_h", "day_start_utc",
            "day_end_utc"] + [e[0] for e in EVENTS]
    rows = []
    for k, (label, lat, lon, course, speed, day) in enumerate(cases, 1):
        rows.append([str(k), label, "%.4f" % lat, "%.4f" % lon, "%.1f" % course, "%.1f" % speed]
                    + one(lat, lon, course, speed, day))
    path = os.path.join(outdir, "planning-moving-pyephem.tsv")
    tmp = path + ".tmp"
    with open(tmp, "w") as f:
        f.write("\n".join(head) + "\n")
        f.write("\t".join(cols) + "\n")
        for r in rows:
            f.write("\t".join(r) + "\n")
    os.replace(tmp, path)


if __name__ == "__main__":
    main()
