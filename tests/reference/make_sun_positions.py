#!/usr/bin/env python3
"""Regenerates the solar-position reference tables used by CanopyAdvisor's SPA tests.

Reference: PyEphem 4.1.4 (Debian package python3-ephem; libastro, VSOP87 for the sun), a general-purpose
astronomy library independent of the NREL SPA code.

Outputs (next to this script):
  sun_positions.csv  topocentric apparent sun zenith and azimuth over 2026 at six sites in both hemispheres,
                     including polar day and polar night:
                     zenithDeg         WITHOUT refraction (observer.pressure = 0), compared with SPA's e0 (eq. 41)
                                       on every row, below the horizon too;
                     refractedZenithDeg WITH ephem's refraction at 1010 mbar and 10 C (the reference conditions of
                                       SPA's refraction formula, eq. 42), compared with SPA's refracted zenith only
                                       where the sun is above the horizon: below it SPA stops refracting at
                                       e0 < -(0.26667 + 0.5667) deg while ephem's model goes on, so the models
                                       differ there by design.
  sun_times.csv      sunrise and sunset (sun centre at -0.8333 deg geometric altitude, no refraction: the same
                     horizon as SPA appendix A.2, h0' = -(0.26667 + 0.5667) deg), or the polar day/night flag.

Delta T: ephem uses its own Delta T (ephem.delta_t; about 74 s for 2026, an extrapolation). Each row stores it
(deltaTSeconds) so that the test runs SPA with the same Delta T; otherwise 1 s of Delta T would shift the sun by
about 0.004 deg.

Sites use fixed UTC offsets (no daylight saving) so local dates are unambiguous.
Run: /usr/bin/python3 tests/reference/make_sun_positions.py
"""

import csv
import datetime as dt
import math
import os

import ephem

# name, latitude deg N, longitude deg E, elevation m, UTC offset hours
SITES = [
    ("longyearbyen", 78.22, 15.65, 10.0, 1),
    ("wageningen", 51.97, 5.67, 10.0, 1),
    ("golden", 39.742476, -105.1786, 1830.14, -7),
    ("equator", 0.0, 32.58, 1200.0, 3),
    ("cape-town", -33.92, 18.42, 10.0, 2),
    ("antarctic-70s", -70.0, 11.8, 100.0, 1),
]

YEAR = 2026
# One day per month, varied through the month; eight local times per day, 3 h apart, not on the hour.
DAYS = [(m, 1 + (7 * m) % 27) for m in range(1, 13)]
LOCAL_TIMES = [(h, 17, 30) for h in range(1, 24, 3)]


def observer(lat, lon, elevation):
    o = ephem.Observer()
    o.lat = str(lat)
    o.lon = str(lon)
    o.elevation = elevation
    o.pressure = 0.0  # no refraction
    o.temp = 10.0
    return o


def utc_string(d):
    return d.strftime("%Y-%m-%dT%H:%M:%SZ")


def positions(rows):
    for name, lat, lon, elev, offset in SITES:
        zone = dt.timezone(dt.timedelta(hours=offset))
        for month, day in DAYS:
            for hour, minute, second in LOCAL_TIMES:
                local = dt.datetime(YEAR, month, day, hour, minute, second, tzinfo=zone)
                utc = local.astimezone(dt.timezone.utc)
                o = observer(lat, lon, elev)
                o.date = ephem.Date(utc.replace(tzinfo=None))
                sun = ephem.Sun(o)
                zenith = 90.0 - math.degrees(sun.alt)
                azimuth = math.degrees(sun.az) % 360.0
                o.pressure = 1010.0
                o.temp = 10.0
                refracted = 90.0 - math.degrees(ephem.Sun(o).alt)
                rows.append([name, lat, lon, elev, utc_string(utc), f"{ephem.delta_t(o.date):.3f}",
                             f"{zenith:.6f}", f"{azimuth:.6f}", f"{refracted:.6f}"])


def times(rows):
    for name, lat, lon, elev, offset in SITES:
        zone = dt.timezone(dt.timedelta(hours=offset))
        for month, day in DAYS:
            midnight = dt.datetime(YEAR, month, day, tzinfo=zone)
            next_midnight = midnight + dt.timedelta(days=1)
            o = observer(lat, lon, elev)
            o.horizon = "-0:50"  # -0.8333 deg, sun centre (use_center=True)
            o.date = ephem.Date(midnight.astimezone(dt.timezone.utc).replace(tzinfo=None))
            kind, rise, set_ = "RisesAndSets", "", ""
            try:
                r = o.next_rising(ephem.Sun(), use_center=True).datetime().replace(tzinfo=dt.timezone.utc)
                s = o.next_setting(ephem.Sun(), use_center=True).datetime().replace(tzinfo=dt.timezone.utc)
                if not (midnight <= r < next_midnight and midnight <= s < next_midnight):
                    kind = "NotWithinLocalDate"
                rise = r.astimezone(zone).strftime("%H:%M:%S")
                set_ = s.astimezone(zone).strftime("%H:%M:%S")
            except ephem.AlwaysUpError:
                kind = "PolarDay"
            except ephem.NeverUpError:
                kind = "PolarNight"
            noon = ephem.Date((midnight + dt.timedelta(hours=12)).astimezone(dt.timezone.utc).replace(tzinfo=None))
            rows.append([name, lat, lon, elev, offset, f"{YEAR}-{month:02d}-{day:02d}",
                         f"{ephem.delta_t(noon):.3f}", kind, rise, set_])


def write(path, header, rows):
    with open(path, "w", newline="") as f:
        f.write(f"# Generated by make_sun_positions.py with PyEphem {ephem.__version__}; see that script.\n")
        w = csv.writer(f, lineterminator="\n")
        w.writerow(header)
        w.writerows(rows)


def main():
    here = os.path.dirname(os.path.abspath(__file__))
    p = []
    positions(p)
    write(os.path.join(here, "sun_positions.csv"),
          ["site", "latitudeDeg", "longitudeDeg", "elevationM", "utc", "deltaTSeconds", "zenithDeg", "azimuthDeg",
           "refractedZenithDeg"], p)
    t = []
    times(t)
    write(os.path.join(here, "sun_times.csv"),
          ["site", "latitudeDeg", "longitudeDeg", "elevationM", "utcOffsetHours", "localDate", "deltaTSeconds",
           "kind", "sunriseLocal", "sunsetLocal"], t)


if __name__ == "__main__":
    main()
