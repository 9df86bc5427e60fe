#!/usr/bin/python3
"""Prints swetest against two worked examples of Meeus, Astronomical Algorithms, 2nd ed. (values
from memory): Example 25.a (Sun, 1992 Oct 13.0 TD) and Example 47.a (Moon, JDE 2448724.5).
Output is a Markdown table for reference/README.md. Usage: /usr/bin/python3 reference/meeus_spot_checks.py
"""
import os
import sys

sys.path.insert(0, os.path.dirname(os.path.abspath(__file__)))
import swe_common as S  # noqa: E402

AU_KM = 149597870.700


def main():
    S.ensure_swetest()
    args = [S.EDIR, "-p01", "-fPadR", "-ep"]
    ans = S.run_dates(args, ["2448908.5", "2448724.5"])
    sun = ans[0][0]
    moon = ans[1][1]
    sun_ra, sun_dec = float(sun[1]), float(sun[2])
    moon_ra, moon_dec, moon_km = float(moon[1]), float(moon[2]), float(moon[3]) * AU_KM
    # Meeus 25.a (low-accuracy method): RA 13h13m31.4s, Dec -7d47'06" (from memory)
    m_ra = (13 + 13 / 60 + 31.4 / 3600) * 15
    m_dec = -(7 + 47 / 60 + 6 / 3600)
    # Meeus 47.a: apparent RA 134.688470 deg, Dec +13.768368 deg, distance 368409.7 km (from memory)
    print(S.versions_line() + "; " + S.ephemeris_check().split(";")[0])
    print()
    print("command: swetest %s -head -g'|' with standard input 'j2448908.5', 'j2448724.5', '.'"
          % " ".join(args))
    print()
    print("| check | Meeus (from memory) | swetest | swetest - Meeus |")
    print("|---|---|---|---|")
    print("| Ex. 25.a Sun RA, 1992-10-13.0 TD | 13h13m31.4s = %.6f deg | %.8f deg = 13h%02dm%06.3fs "
          "| %+.2f\" (%+.3f s) |" % (m_ra, sun_ra, int((sun_ra / 15 - 13) * 60),
                                     ((sun_ra / 15 - 13) * 60 % 1) * 60,
                                     (sun_ra - m_ra) * 3600, (sun_ra - m_ra) * 240))
    print("| Ex. 25.a Sun Dec | -7d47'06\" = %.6f deg | %.8f deg | %+.2f\" |"
          % (m_dec, sun_dec, (sun_dec - m_dec) * 3600))
    print("| Ex. 47.a Moon RA, JDE 2448724.5 | 134.688470 deg | %.8f deg | %+.2f\" |"
          % (moon_ra, (moon_ra - 134.688470) * 3600))
    print("| Ex. 47.a Moon Dec | +13.768368 deg | %.8f deg | %+.2f\" |"
          % (moon_dec, (moon_dec - 13.768368) * 3600))
    print("| Ex. 47.a Moon distance | 368409.7 km | %.1f km | %+.1f km |"
          % (moon_km, moon_km - 368409.7))


if __name__ == "__main__":
    main()
