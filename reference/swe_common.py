"""Shared helpers for the scripts that write the swetest reference tables.

Runs the Debian `swetest` program (Swiss Ephemeris command line) and reads only what it prints.
Nothing of its code or data files is copied into the project.
"""
import os
import re
import shutil
import subprocess
import sys

EPHE_DIR = "/usr/share/libswe/ephe"
EPHE_FILES = ("sepl_18.se1", "semo_18.se1")
EDIR = "-edir" + EPHE_DIR
CHUNK = 400  # instants per swetest run (one run prints at most 36,525 lines)


def fail(msg):
    sys.stderr.write("error: " + msg + "\n")
    sys.exit(2)


def ensure_swetest():
    """Installs swetest and its JPL-based files with apt-get when they are missing."""
    def present():
        return shutil.which("swetest") and all(
            os.path.exists(os.path.join(EPHE_DIR, f)) for f in EPHE_FILES)
    if present():
        return
    cmd = ["apt-get", "install", "-y", "swetest", "swe-basic-data"]
    if subprocess.call(cmd) != 0:
        subprocess.check_call(["apt-get", "update"])
        subprocess.check_call(cmd)
    if not present():
        fail("swetest or %s/%s still missing after apt-get" % (EPHE_DIR, EPHE_FILES))


def dpkg_version(pkg):
    out = subprocess.run(["dpkg-query", "-W", "-f=${Version}", pkg],
                         capture_output=True, text=True)
    return out.stdout.strip() if out.returncode == 0 else "not installed"


def swetest_version():
    out = subprocess.run(["swetest", "-h"], capture_output=True, text=True,
                         encoding="latin-1").stdout
    m = re.search(r"Version:\s*(\S+)", out)
    return m.group(1) if m else "unknown"


def run(args, stdin_text=None):
    """Runs swetest with args; refuses output that mentions the Moshier fallback or a warning."""
    res = subprocess.run(["swetest"] + args, input=stdin_text, capture_output=True,
                         text=True, encoding="utf-8", errors="replace")
    both = res.stdout + res.stderr
    low = both.lower()
    if "moshier" in low or "warning" in low or "error" in low or "not found" in low:
        fail("swetest %s printed a warning (Moshier fallback or missing file):\n%s"
             % (" ".join(args), both[:2000]))
    if res.returncode != 0:
        fail("swetest %s exited %d:\n%s" % (" ".join(args), res.returncode, both[:2000]))
    return res.stdout


def run_dates(args, jd_strings):
    """Runs swetest in its interactive mode: one 'j<JD>' line per instant on standard input.

    Returns, per instant, the list of data lines (fields split on '|') in input order."""
    out_rows = []
    for i in range(0, len(jd_strings), CHUNK):
        chunk = jd_strings[i:i + CHUNK]
        text = "".join("j%s\n" % s for s in chunk) + ".\n"
        out = run(args + ["-head", "-g|"], text)
        # each answer starts after a 'Date ?' prompt
        parts = out.split("Date ?")[1:]
        answers = []
        for p in parts:
            lines = [ln for ln in p.splitlines() if "|" in ln]
            if lines:
                answers.append([[f.strip() for f in ln.split("|")] for ln in lines])
        if len(answers) != len(chunk):
            fail("swetest gave %d answers for %d instants (args %s)"
                 % (len(answers), len(chunk), " ".join(args)))
        out_rows.extend(answers)
    return out_rows


def ephemeris_check():
    """Proves the JPL-based files were used: no fallback warning in a full-header run, and a
    Moon position that differs from swetest's own Moshier theory (-emos). Returns a header line."""
    probe = [EDIR, "-j2451545.0", "-p1", "-fPad", "-ep"]
    out = run(probe)  # full header, so a 'using Moshier eph.' warning would show (run() refuses it)
    swe = [ln for ln in out.splitlines() if ln.startswith("Moon")][-1].split()
    mos = subprocess.run(["swetest", "-emos", "-j2451545.0", "-p1", "-fPad", "-ep", "-head"],
                         capture_output=True, text=True).stdout.split()
    d_ra = (float(swe[1]) - float(mos[1])) * 3600.0
    d_dec = (float(swe[2]) - float(mos[2])) * 3600.0
    if abs(d_ra) < 1e-6 and abs(d_dec) < 1e-6:
        fail("swetest -eswe and -emos agree exactly: the ephemeris files were not used")
    return ("ephemeris: Swiss Ephemeris files %s in %s (compressed from JPL DE431), passed as %s; "
            "no 'Moshier' fallback warning in the full-header probe run 'swetest %s'; "
            "Moon RA/Dec at JD 2451545.0 TT differs from swetest -emos by %.3f\"/%.3f\""
            % ("+".join(EPHE_FILES), EPHE_DIR, EDIR, " ".join(probe), d_ra, d_dec))


def versions_line():
    return ("tools: swetest %s (Debian swetest %s, libswe2.0 %s, swe-basic-data %s)"
            % (swetest_version(), dpkg_version("swetest"), dpkg_version("libswe2.0"),
               dpkg_version("swe-basic-data")))


def dms_to_deg(text):
    """Parses swetest's d°m's.sss field (degree sign in any encoding) to degrees."""
    m = re.match(r"^\s*(-?)(\d+)\D+?(\d+)'\s*([\d.]+)", text)
    if not m:
        fail("cannot read a d m s field: %r" % text)
    v = int(m.group(2)) + int(m.group(3)) / 60.0 + float(m.group(4)) / 3600.0
    return -v if m.group(1) == "-" else v


def mag(text):
    if not text.endswith("m"):
        fail("cannot read a magnitude field: %r" % text)
    return text[:-1]


def write_table(path, header_lines, columns, rows):
    tmp = path + ".tmp"
    with open(tmp, "w", encoding="utf-8", newline="\n") as f:
        for h in header_lines:
            f.write(("# " + h).rstrip() + "\n")
        f.write("\t".join(columns) + "\n")
        for r in rows:
            f.write("\t".join(r) + "\n")
    os.replace(tmp, path)
