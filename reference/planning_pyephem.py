#!/usr/bin/python3
"""Writes planning-pyephem.tsv: sunrise, sunset, civil and nautical twilight, the Sun's meridian
transit, moonrise and moonset from PyEphem for random places and dates 2000-2040 and named edge
cases, each for one local zone day.

Usage: /usr/bin/python3 reference/planning_pyephem.py [OUTDIR]
"""
import datetime
import math
import os
import random
import subprocess
import sys


def ensure_ephem():
    try:
        import ephem  # noqa: F401
    except ImportError:
        cmd = ["apt-get", "install", "-y", "python3-ephem"]
        if subprocess.call(cmd) != 0:
            subprocess.check_call(["apt-get", "update"])
            subprocess.check_call(cmd)


ensure_ephem()
import ephem  # noqa: E402

SEED = 20402000
N_RANDOM = 300
D_START = datetime.date(2000, 1, 1)
D_END = datetime.date(2040, 12, 31)      # inclusive
# (label, lat, lon, local date)
EDGE = [
    ("70N midsummer: polar day", 70.0, 20.0, "2024-06-21"),
    ("70N midwinter: polar night", 70.0, 20.0, "2024-12-21"),
    ("70N near the start of polar day", 70.0, 20.0, "2024-05-17"),
    ("70N near the end of polar night", 70.0, 20.0, "2025-01-16"),
    ("78N midsummer", 78.0, 15.0, "2024-06-21"),
    ("78N midwinter: no civil twilight", 78.0, 15.0, "2024-12-21"),
    ("78N equinox", 78.0, 15.0, "2024-03-20"),
    ("70S midsummer (December): polar day", -70.0, -60.0, "2024-12-21"),
    ("60N midsummer: no nautical dusk", 60.0, 25.0, "2024-06-21"),
    ("date line 180E (zone +12)", -17.0, 180.0, "2024-03-01"),
    ("date line 180W (zone -12)", -17.0, -180.0, "2024-03-01"),
    ("just east of 180 (zone -12)", 52.0, -179.5, "2024-09-10"),
    ("just west of 180 (zone +12)", 52.0, 179.5, "2024-09-10"),
    ("equator at Greenwich, equinox", 0.0, 0.0, "2024-03-20"),
    ("equator at Greenwich, June solstice", 0.0, 0.0, "2024-06-21"),
    ("equator 90W, December solstice", 0.0, -90.0, "2024-12-21"),
    ("Greenwich 51.5N, new year", 51.4769, 0.0, "2000-01-01"),
]
SUN_HORIZON = "-0:34"     # upper limb, standard refraction 34'
MOON_HORIZON = "-0:34"
CIVIL = "-6"
NAUTICAL = "-12"


def zone_hours(lon):
    """Nautical time zone (zone time = UTC + zone_hours), 15 deg wide, centred on multiples of
    15 deg; lon +180 -> +12, lon -180 -> -12 (the two halves of the date-line zone)."""
    return int(math.floor(lon / 15.0 + 0.5)) if lon < 180.0 else 12


def iso(d):
    dt = ephem.Date(d).datetime()
    dt = dt.replace(microsecond=0) + datetime.timedelta(
        seconds=round(ephem.Date(d).datetime().microsecond / 1e6))
    return dt.strftime("%Y-%m-%dT%H:%M:%SZ")


def events(obs, body, horizon, use_center, start, end, kind):
    """First rising/setting of body in [start, end); returns (iso or '', note)."""
    obs.horizon = horizon
    obs.date = start
    fn = obs.next_rising if kind == "rise" else obs.next_setting
    try:
        t = fn(body, use_center=use_center)
    except ephem.AlwaysUpError:
        return "", "always_up"
    except ephem.NeverUpError:
        return "", "never_up"
    if t >= end:
        return "", ""
    note = ""
    obs.date = ephem.Date(t + ephem.minute)
    try:
        t2 = fn(body, use_center=use_center)
        if t2 < end:
            note = "second:" + iso(t2)
    except (ephem.AlwaysUpError, ephem.NeverUpError):
        pass
    return iso(t), note


def one_day(lat, lon, date_text):
    zh = zone_hours(lon)
    y, m, d = (int(x) for x in date_text.split("-"))
    start_dt = datetime.datetime(y, m, d) - datetime.timedelta(hours=zh)
    start = ephem.Date(start_dt)
    end = ephem.Date(start + 1.0)
    obs = ephem.Observer()
    obs.lat = str(lat)
    obs.lon = str(lon)
    obs.elevation = 0.0
    obs.pressure = 0.0       # no PyEphem refraction: the horizon angle carries it
    obs.temp = 10.0
    sun, moon = ephem.Sun(), ephem.Moon()
    cells, notes = [], []
    for name, body, hz, center, kind in [
            ("sunrise", sun, SUN_HORIZON, False, "rise"),
            ("sunset", sun, SUN_HORIZON, False, "set"),
            ("civil_dawn", sun, CIVIL, True, "rise"),
            ("civil_dusk", sun, CIVIL, True, "set"),
            ("nautical_dawn", sun, NAUTICAL, True, "rise"),
            ("nautical_dusk", sun, NAUTICAL, True, "set")]:
        v, n = events(obs, body, hz, center, start, end, kind)
        cells.append(v)
        if n:
            notes.append(name + ":" + n)
    obs.horizon = "0"
    obs.date = start
    tr = obs.next_transit(sun)
    cells.append(iso(tr) if tr < end else "")
    for name, kind in (("moonrise", "rise"), ("moonset", "set")):
        v, n = events(obs, moon, MOON_HORIZON, False, start, end, kind)
        cells.append(v)
        if n:
            notes.append(name + ":" + n)
    dt_s = ephem.delta_t(start)
    return ([date_text, str(zh), iso(start), iso(end), "%.3f" % dt_s] + cells
            + [";".join(notes)])


def main():
    outdir = sys.argv[1] if len(sys.argv) > 1 else os.path.join(
        os.path.dirname(os.path.abspath(__file__)), "..", "plugin", "src", "test", "resources",
        "reference")
    rng = random.Random(SEED)
    cases = []
    ndays = (D_END - D_START).days + 1
    for i in range(N_RANDOM):
        lat = round(rng.uniform(-65.0, 65.0), 4)
        lon = round(rng.uniform(-180.0, 180.0), 4)
        day = D_START + datetime.timedelta(days=rng.randrange(ndays))
        cases.append(("random", lat, lon, day.isoformat()))
    cases.extend(EDGE)
    rows = []
    for k, (label, lat, lon, day) in enumerate(cases, 1):
        rows.append([str(k), label, "%.4f" % lat, "%.4f" % lon] + one_day(lat, lon, day))
    header = [
        "planning-pyephem.tsv: sunrise, sunset, twilight, the Sun's meridian transit, moonrise "
        "and moonset from PyEphem, for one local zone day at a place.",
        "Written by reference/planning_pyephem.py; do not edit by hand (reference/check-all.sh "
        "regenerates and compares).",
        "tools: PyEphem %s (Debian python3-ephem), /usr/bin/python3 %s"
        % (ephem.__version__, sys.version.split()[0]),
        "command: /usr/bin/python3 reference/planning_pyephem.py [OUTDIR]",
        "cases: %d random (Python random.Random(%d): lat uniform [-65, 65), lon uniform "
        "[-180, 180), both rounded to 1e-4 deg; local date uniform over 2000-01-01..2040-12-31), "
        "then %d named edge cases (label column)" % (N_RANDOM, SEED, len(EDGE)),
        "the day: the LOCAL ZONE DAY, 00:00 to 24:00 zone time, zone_h = floor(lon/15 + 0.5) "
        "(zone time = UTC + zone_h; lon +180 -> +12, lon -180 -> -12: the two halves of the "
        "date-line zone); an event is listed when it falls in [day_start_utc, day_end_utc); the "
        "first one is listed, a second one of the same kind in that day is in notes",
        "PyEphem settings: observer elevation 0 m, pressure 0 (PyEphem's own refraction off; the "
        "horizon angle carries the standard refraction), temp 10 C (unused with pressure 0)",
        "  sunrise/sunset:  horizon -0:34, use_center=False: the Sun's UPPER LIMB 34' below the "
        "geometric horizon, i.e. centre at -(34' + semi-diameter of the day), semi-diameter from "
        "PyEphem's own Sun (15.8'..16.3')",
        "  civil dawn/dusk: horizon -6, use_center=True (centre at -6 deg, geometric)",
        "  nautical dawn/dusk: horizon -12, use_center=True (centre at -12 deg, geometric)",
        "  sun_transit:     next_transit(Sun): upper meridian passage of the Sun's centre = local "
        "apparent noon",
        "  moonrise/moonset: horizon -0:34, use_center=False: the Moon's upper limb, TOPOCENTRIC "
        "place (PyEphem applies the Moon's parallax for the observer), i.e. centre at "
        "-(34' + topocentric semi-diameter)",
        "time scale: PyEphem dates are UT (PyEphem treats UTC and UT1 alike: no leap seconds, "
        "no DUT1); it converts to TT with its own Delta T (delta_t_s, at day_start_utc). Times "
        "are rounded to the whole second; PyEphem's rise/set search is good to about a second "
        "against its own theory (VSOP87/ELP, from memory of its documentation)",
        "empty cell: the event does not happen in that zone day; notes says why when PyEphem "
        "reports it: always_up / never_up (e.g. polar day or night)",
        "columns:",
        "  case label lat_deg lon_deg  case number, 'random' or the edge-case label, place "
        "(geodetic degrees, north and east positive)",
        "  date            the local zone date, YYYY-MM-DD",
        "  zone_h          zone time = UTC + zone_h hours",
        "  day_start_utc day_end_utc  the zone day in UTC, ISO 8601",
        "  delta_t_s       PyEphem's Delta T (TT - UT) at day_start_utc, seconds",
        "  sunrise sunset civil_dawn civil_dusk nautical_dawn nautical_dusk sun_transit moonrise "
        "moonset  ISO 8601 UTC (YYYY-MM-DDTHH:MM:SSZ) or empty",
        "  notes           ';'-separated event:reason (always_up, never_up, second:<time>)",
    ]
    cols = ["case", "label", "lat_deg", "lon_deg", "date", "zone_h", "day_start_utc",
            "day_end_utc", "delta_t_s", "sunrise", "sunset", "civil_dawn", "civil_dusk",
            "nautical_dawn", "nautical_dusk", "sun_transit", "moonrise", "moonset", "notes"]
    path = os.path.join(outdir, "planning-pyephem.tsv")
    tmp = path + ".tmp"
    with open(tmp, "w", encoding="utf-8", newline="\n") as f:
        for h in header:
            f.write("# " + h + "\n")
        f.write("\t".join(cols) + "\n")
        for r in rows:
            f.write("\t".join(r) + "\n")
    os.replace(tmp, path)


if __name__ == "__main__":
    main()
