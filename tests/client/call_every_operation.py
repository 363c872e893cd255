"""Calls every operation of the OpenAPI document through the generated Python client only.

Usage: python call_every_operation.py --document openapi/openapi.json \
           --client-dir DIR_WITH_eigenzeit_client --base-url http://127.0.0.1:PORT

The operations come from the document: an operation without a check here, or a check for an
operation the document no longer has, fails the run (a new endpoint needs a check). Each check
calls its operation through the generated module (`eigenzeit_client.api.<tag>.<operationId>`),
with the generated models, and checks the status, the content type and a few fields, each
against the source named beside it. All satellites and stations are invented.
"""

import argparse
import csv
import importlib
import io
import json
import math
import sys
from decimal import Decimal

from support import (
    C_M_S,
    by_scale,
    circular_orbit_rate,
    circular_states,
    equatorial_xy_m,
    expect,
    expect_problem,
    near,
)

CHECKS = {}
CALLED = set()


def operation(operation_id):
    def register(check):
        CHECKS[operation_id] = check
        return check

    return register


# -- operations --------------------------------------------------------------------------------


@operation("healthz")
def healthz(api, m, document):
    health = expect(api.call("healthz"), 200)
    assert health.status == "ok", health
    assert health.version == document["info"]["version"], health


@operation("readyz")
def readyz(api, m, document):
    readiness = expect(api.call("readyz"), 200)
    assert readiness.status == "ready", readiness
    assert readiness.leap_seconds.source, readiness


@operation("scales")
def scales(api, m, document):
    response = api.call("scales")
    answer = expect(response, 200)
    names = [scale.name for scale in answer.scales]
    assert sorted(names) == sorted(scale.value for scale in m.ScaleName), names
    # UTC is the only scale with leap seconds (IERS Conventions 2010, chapter 10).
    assert [scale.name for scale in answer.scales if scale.has_leap_seconds] == ["UTC"]
    again = api.call("scales", if_none_match=response.headers["etag"])
    expect(again, 304, None)
    assert again.headers["etag"] == response.headers["etag"]


@operation("leap_seconds")
def leap_seconds(api, m, document):
    response = api.call("leap_seconds")
    table = expect(response, 200)
    first, steps = table.entries[0], {entry.utc_date: entry for entry in table.entries}
    # First step: 1960-01-01, 1.4178180 s + (MJD - 37300) x 0.001296 s
    # (USNO tai-utc.dat, from memory).
    assert (first.utc_date, first.mjd) == ("1960-01-01", 36934), first
    near(first.tai_minus_utc_s, 1.4178180, 1e-9, "TAI-UTC on 1960-01-01")
    near(first.drift_s_per_day, 0.001296, 1e-12, "drift of 1960")
    assert first.drift_reference_mjd == 37300, first
    # The step of 2017-01-01 (MJD 57754): TAI-UTC = 37 s (IERS Bulletin C 52).
    step = steps["2017-01-01"]
    assert (step.mjd, step.tai_minus_utc_s) == (57754, 37.0), step
    again = api.call("leap_seconds", if_none_match=response.headers["etag"])
    expect(again, 304, None)


@operation("now")
def now(api, m, document):
    answer = expect(api.call("now"), 200)
    assert answer.input_.scale == "UTC", answer.input_
    results = by_scale(answer.results)
    # Every scale but UT1, which needs the Earth orientation table (as `all`; the scale list
    # says so with needs_earth_orientation).
    expected = sorted(scale.value for scale in m.ScaleName if scale.value != "UT1")
    assert sorted(results) == expected, sorted(results)
    assert Decimal(results["UTC"].difference_exact_s) == 0, results["UTC"]
    # TT - TAI = 32.184 s exactly (IAU 1991 Resolution A4, IERS Conventions 2010 eq. 10.2).
    tt_minus_tai_s = Decimal(results["TT"].difference_exact_s) - Decimal(
        results["TAI"].difference_exact_s
    )
    assert tt_minus_tai_s == Decimal("32.184"), tt_minus_tai_s


@operation("convert_get")
def convert_get(api, m, document):
    answer = expect(
        api.call(
            "convert_get",
            at="2026-03-14T06:30:00",
            from_=m.ScaleName.UTC,
            to="TAI,TT",
            format_=m.InstantFormatName.ISO,
        ),
        200,
    )
    results = by_scale(answer.results)
    # TAI - UTC = 37 s since 2017-01-01 (IERS Bulletin C); TT = TAI + 32.184 s (IAU 1991 A4).
    assert Decimal(results["TAI"].difference_exact_s) == 37, results["TAI"]
    assert results["TAI"].difference_s == 37.0
    assert results["TAI"].iso.startswith("2026-03-14T06:30:37"), results["TAI"].iso
    assert Decimal(results["TT"].difference_exact_s) == Decimal("69.184"), results["TT"]
    # UT1 - UTC stays within 0.9 s (ITU-R TF.460-6); 2026-03-14 is an observed day.
    ut1 = expect(api.call("convert_get", at="2026-03-14T06:30:00", to="UT1"), 200)
    assert abs(Decimal(ut1.results[0].difference_exact_s)) < Decimal("0.9"), ut1.results[0]
    assert ut1.warnings == [], ut1.warnings
    # A selenocentric observer at the lunar south pole moves TCL by -v_M.x/c^2 (IAU 2000
    # B1.5 with the Moon for the Earth): at most |v_M| r / c^2 = 6e-7 s (common practice).
    centre = expect(api.call("convert_get", at="2026-03-14T06:30:00", to="TCL"), 200)
    pole = expect(
        api.call(
            "convert_get",
            at="2026-03-14T06:30:00",
            to="TCL",
            selenocentric_observer_m="0,0,-1737400",
        ),
        200,
    )
    moved = Decimal(pole.results[0].difference_exact_s) - Decimal(centre.results[0].difference_exact_s)
    assert Decimal("1e-9") < abs(moved) < Decimal("6.3e-7"), moved
    expect_problem(
        api.call("convert_get", at="2026-03-14T06:30:00", to="TCL", selenocentric_observer_m="0,0,1e6"),
        422,
        "below_surface",
        field="selenocentric_observer_m",
    )
    # An unknown scale and a date that does not exist are 422 problems with their codes.
    expect_problem(
        api.call("convert_get", at="2026-03-14T06:30:00", to="TAI,XYZ"),
        422,
        "unknown_scale",
        field="to[1]",
    )
    expect_problem(
        api.call("convert_get", at="2026-02-30T00:00:00", from_=m.ScaleName.UTC),
        422,
        "impossible_date",
        field="at",
    )
    # The DE440 TDB - TT model: the answer names it; it stays within 30 ns of the default
    # series in 2026 (tests/reference/tdb_ephemeris_reference.csv, tools/make_ephemeris_time.py)
    # and covers 1959-12-30 to 2101-01-02 TT only.
    series = expect(api.call("convert_get", at="2026-03-14T06:30:00", to="TDB"), 200)
    ephemeris = expect(
        api.call(
            "convert_get",
            at="2026-03-14T06:30:00",
            to="TDB",
            tdb_model=m.TdbModelName.EPHEMERIS,
        ),
        200,
    )
    assert series.tdb_model == "series", series.tdb_model
    assert ephemeris.tdb_model == "ephemeris", ephemeris.tdb_model
    gap = Decimal(ephemeris.results[0].difference_exact_s) - Decimal(
        series.results[0].difference_exact_s
    )
    assert abs(gap) < Decimal("30e-9"), gap
    expect_problem(
        api.call(
            "convert_get",
            at="2150-01-01T00:00:00",
            to="TDB",
            tdb_model=m.TdbModelName.EPHEMERIS,
        ),
        422,
        "outside_tdb_model_span",
        field="at",
    )
    # A broadcast GPS LNAV (10-bit) week: 337 near 2026 is full week 2385 (issue 13; IS-GPS-200).
    week = expect(
        api.call(
            "convert_get",
            at="337:0",
            from_=m.ScaleName.GPST,
            to="GPST",
            format_=m.InstantFormatName.GNSS_WEEK,
            forms="gnss_week",
            week_counter=m.WeekCounterName.GPS_LNAV,
            week_near="2026-01-01",
        ),
        200,
    )
    assert week.input_.gnss_week == "2385:0.0", week.input_
    assert "full week 2385" in week.warnings[0], week.warnings
    # The lunar scales: TCL runs ahead of TDB (mean rate 6.8e-10, Lu, Yang & Xie 2025): in 2026
    # TCL - TDB is near +1.05 s plus periodic terms; TL carries the proposal warning; both end
    # with the fitted span in 2101.
    lunar = expect(api.call("convert_get", at="2026-03-14T06:30:00", to="TDB,TCL,TL"), 200)
    tdb, tcl, tl = (Decimal(r.difference_exact_s) for r in lunar.results)
    assert Decimal("1.0") < tcl - tdb < Decimal("1.1"), tcl - tdb
    assert Decimal("0") < tcl - tl < Decimal("0.1"), tcl - tl
    assert any("proposal" in w for w in lunar.warnings), lunar.warnings
    expect_problem(
        api.call("convert_get", at="2150-01-01T00:00:00", to="TCL"),
        422,
        "outside_lunar_time_span",
        field="at",
    )


@operation("convert_post")
def convert_post(api, m, document):
    body = m.ConvertBatchRequest.from_dict(
        {
            "from": "UTC",
            "to": ["TAI"],
            "format": "iso",
            "epochs": ["2016-12-31T23:59:60.5", "2017-01-01T00:00:00"],
        }
    )
    batch = expect(api.call("convert_post", body=body), 200)
    # The leap second at the end of 2016: TAI - UTC 36 s before, 37 s after (IERS Bulletin C 52).
    inside, after = (conversion.results[0] for conversion in batch.conversions)
    assert inside.iso.startswith("2017-01-01T00:00:36.5"), inside.iso
    assert after.iso.startswith("2017-01-01T00:00:37"), after.iso
    body = m.ConvertBatchRequest.from_dict(
        {"from": "UTC", "to": ["TAI"], "epochs": ["2026-03-14T06:30:00", "2026-02-30T00:00:00"]}
    )
    expect_problem(api.call("convert_post", body=body), 422, "impossible_date", field="epochs[1]")


@operation("eop")
def eop(api, m, document):
    table = expect(api.call("eop"), 200)
    assert table.source and table.day_count > 0, table
    answer = expect(api.call("eop", at="2026-10-01T00:00:00Z"), 200)
    values = answer.at
    # IERS Bulletin A (finals2000A.all, astropy-iers-data 0.2026.11.2.0.34.55), MJD 61314:
    # UT1 - UTC = -0.0225232 s, x_p = 0.174596", y_p = 0.325269" (observed, flag I); the line
    # is committed as tests/reference/eop_finals2000A_2026_2027.all line 62.
    assert values.status == "observed", values
    assert abs(values.ut1_minus_utc_s - -0.0225232) < 1e-9, values.ut1_minus_utc_s
    assert abs(values.xp_arcsec - 0.174596) < 1e-9, values.xp_arcsec
    assert abs(values.yp_arcsec - 0.325269) < 1e-9, values.yp_arcsec
    # Before the table (it starts 1962-01-01 with IERS EOP 20 C04): a 422 naming `at`.
    expect_problem(api.call("eop", at="1961-06-01T00:00:00Z"), 422, "eop_before_table", field="at")


@operation("rate")
def rate(api, m, document):
    body = m.RateRequest.from_dict(
        {
            "reference": "TT",
            "gravity_model": "point_mass",
            "items": [
                # An invented MEO clock and an invented station on the geoid.
                {"orbit": {"semi_major_axis_m": 26_561_750.0, "eccentricity": 0.0}},
                {
                    "ground_site": {
                        "latitude_deg": 41.3,
                        "longitude_deg": 14.7,
                        "height_m": 0.0,
                        "height_reference": "geoid",
                    }
                },
            ],
        }
    )
    answer = expect(api.call("rate", body=body), 200)
    orbit, ground = answer.results
    near(orbit.fractional.total, circular_orbit_rate(26_561_750.0), 1e-15, "MEO rate against TT")
    near(orbit.fractional.total, 4.4647e-10, 1e-14, "IS-GPS-200 3.3.1.1 offset")
    # A clock on the geoid keeps TT (IAU 2000 B1.9: TT is defined through W0 on the geoid).
    near(ground.fractional.total, 0.0, 1e-18, "geoid clock against TT")
    # An invented GEO clock with its epoch: the default model is j2_sun_moon (J2 + the Sun and
    # Moon tides); its rate differs from the j2 rate by the tide, at most the closed-form bound
    # at GEO of 3.25e-15 (the tides tests) and not zero.
    def geo(model):
        item = {
            "state": {
                "frame": "GCRS",
                "position_m": [30_000_000.0, 29_600_000.0, 0.0],
                "velocity_m_s": [-2_150.0, 2_180.0, 0.0],
                "epoch": "2026-03-20T06:30:00",
                "epoch_scale": "TT",
            }
        }
        if model is not None:
            item["gravity_model"] = model
        return item

    tides_body = m.RateRequest.from_dict({"items": [geo(None), geo("j2")]})
    with_tides, j2_only = expect(api.call("rate", body=tides_body), 200).results
    assert with_tides.gravity_model == "j2_sun_moon", with_tides.gravity_model
    tide = with_tides.fractional.total - j2_only.fractional.total
    assert 1e-17 < abs(tide) <= 3.25e-15, tide
    # The invented Selene Gate south-pole clock over one anomalistic month (27.55455 d) on the
    # DE440 lunar orbit: about 56.02 us/day against TT (Ashby & Patla 2024, Astron. J.
    # 168:112), the periodic part apart (Turyshev et al. arXiv:2406.16147 v5: 0.470 us
    # amplitude at the anomalistic month), TL's proposal warning, and a 422 naming the span.
    site = {"latitude_deg": -89.5, "longitude_deg": 36.0, "height_m": 1200.0}
    lunar_body = m.RateRequest.from_dict(
        {
            "items": [
                {
                    "lunar_site": dict(
                        site,
                        epoch="2026-03-14T06:30:00",
                        span={"start": "2026-03-01T00:00:00", "end": "2026-03-28T13:18:33"},
                    )
                }
            ]
        }
    )
    (lunar,) = expect(api.call("rate", body=lunar_body), 200).results
    assert lunar.lunar_model == "de440_ephemeris", lunar.lunar_model
    over = lunar.lunar.over_span
    # 56.02 for an equator clock plus this clock's share, 0.0029 us/day (its height and the lunar
    # J2 at the pole: its TL rate +0.00244 against the equator clock's -0.00048, measured in the
    # physics tests).
    assert abs(over.tt.mean_us_per_day - 56.02 - 0.0029) < 0.01, over.tt.mean_us_per_day
    assert 0.7e-6 < over.tt.periodic_peak_to_peak_s < 1.25e-6, over.tt.periodic_peak_to_peak_s
    assert "proposal" in lunar.lunar.tl_warning
    bad = m.RateRequest.from_dict(
        {"items": [{"lunar_site": dict(site, span={"start": "2026-03-02T00:00:00", "end": "2026-03-01T00:00:00"})}]}
    )
    expect_problem(api.call("rate", body=bad), 422, "invalid_value", field="items[0].lunar_site.span")


@operation("compare")
def compare(api, m, document):
    body = m.CompareRequest.from_dict(
        {
            "reference": "TT",
            "clock_a": {"orbit": {"semi_major_axis_m": 29_600_000.0, "eccentricity": 0.0}},
            "clock_b": {
                "ground_site": {
                    "latitude_deg": -33.2,
                    "longitude_deg": 150.9,
                    "height_m": 0.0,
                    "height_reference": "geoid",
                }
            },
        }
    )
    answer = expect(api.call("compare", body=body), 200)
    difference = answer.clock_a.fractional.total - answer.clock_b.fractional.total
    near(answer.a_minus_b.fractional, difference, 1e-18, "a - b from the two rates")
    near(answer.a_minus_b.us_per_day, difference * 86_400e6, 1e-9, "a - b in us per day")
    near(answer.clock_a.fractional.total, circular_orbit_rate(29_600_000.0), 1e-15, "orbit a rate")


@operation("stability")
def stability(api, m, document):
    # NBS14 10-point frequency set (NIST SP 1065): ADEV(1) 91.22945, MDEV(2) 74.78849.
    body = m.StabilityBody.from_dict(
        {
            "kind": "frequency",
            "tau0_s": 1.0,
            "values": [892, 809, 823, 798, 671, 644, 883, 903, 677],
            "deviations": ["adev", "mdev"],
            "tau_s": [1, 2],
        }
    )
    answer = expect(api.call("stability", body=body), 200)
    adev1, adev2, mdev1, mdev2 = answer.results
    near(adev1.value, 91.22945, 1e-4, "NBS14 ADEV(1)")
    near(mdev2.value, 74.78849, 1e-4, "NBS14 MDEV(2)")
    assert adev1.terms == 8, adev1
    assert adev1.low < adev1.value < adev1.high, adev1
    gap = m.StabilityBody.from_dict({"kind": "phase", "tau0_s": 1.0, "values": [0.0, None, 1.0]})
    expect_problem(api.call("stability", body=gap), 422, "gap_in_series", field="values[1]")


@operation("corrections")
def corrections(api, m, document):
    # An invented clock on an equatorial circular orbit (a = 26 561.75 km) in the GCRS: the
    # conventional term -2 r.v/c^2 (IS-GPS-200 20.3.3.3.3.1) and the J2 term (Kouba 2004,
    # sin^2 i = 0) vanish, so the fitted rate is the clock's own 1e-12.
    a_m = 26_561_750.0
    n = math.sqrt(3.986004418e14 / a_m**3)
    samples = []
    for k in range(6):
        t = 600.0 * k
        u = n * t
        samples.append(
            {
                "epoch": f"2026-05-20T00:{10 * k:02d}:00",
                "clock_s": 1e-4 + 1e-12 * t,
                "position_m": [a_m * math.cos(u), a_m * math.sin(u), 0.0],
                "velocity_m_s": [-a_m * n * math.sin(u), a_m * n * math.cos(u), 0.0],
            }
        )
    body = m.CorrectionsRequest.from_dict(
        {"series": [{"id": "LYR-01", "frame": "GCRS", "samples": samples}], "convention": "raw"}
    )
    answer = expect(api.call("corrections", body=body), 200)
    (satellite,) = answer.satellites
    near(satellite.rate, 1e-12, 1e-19, "rate of the invented clock")
    near(answer.factory_setting_rate, 4.4647e-10, 1e-14, "IS-GPS-200 3.3.1.1 offset")


@operation("proper_time")
def proper_time(api, m, document):
    radius_m = 6_878_137.0
    body = m.EphemerisInput.from_dict(
        {
            "frame": "GCRF",
            "time_scale": "TT",
            "objects": [{"id": "WREN-7", "states": circular_states(radius_m, [0, 60, 120, 180])}],
        }
    )
    answer = expect(
        api.call(
            "proper_time",
            body=body,
            reference=m.ProperTimeReferenceName.TT,
            gravity_model=m.GravityModelName.POINT_MASS,
        ),
        200,
    )
    (wren,) = answer.objects
    assert (wren.id, wren.state_count) == ("WREN-7", 4), wren
    # Circular orbit: d(tau)/d(TT) - 1 = L_G - 3GM/(2rc^2) (as for `rate`, same sources).
    near(wren.summary.mean_rate, circular_orbit_rate(radius_m), 1e-14, "LEO mean rate")
    near(
        wren.summary.accumulated_s,
        180.0 * circular_orbit_rate(radius_m),
        1e-11,
        "proper time over 180 s",
    )
    # Without a model: the default j2_sun_moon, named in the answer, with the Sun and Moon tides
    # as their own part (a few 1e-16 of rate for this orbit: well below 1e-12 s in 180 s; IERS
    # Conventions (2010) eq. 10.6 with IAU 2000 Resolution B1.3).
    default = expect(api.call("proper_time", body=body), 200)
    assert default.gravity_model == "j2_sun_moon", default.gravity_model
    (wren,) = default.objects
    tidal = wren.summary.tidal_part_s
    assert tidal != 0.0 and abs(tidal) < 1e-12, tidal


    # The same request drawn (Accept: image/svg+xml): a self-contained SVG with the series.
    drawn = api.call_accepting(
        "image/svg+xml", "proper_time", body=body, reference=m.ProperTimeReferenceName.TT
    )
    expect(drawn, 200, "image/svg+xml")
    svg = drawn.content.decode("utf-8")
    assert "<svg" in svg and 'data-series="tau_minus_t_s"' in svg and "WREN-7" in svg, svg[:300]
    assert "<script" not in svg and "@font-face" not in svg

    # An invented lunar orbiter (TERN-9) on a circle of 1 837.4 km about the Moon, ICRF axes:
    # against TL the answer warns that TL is a proposal; against TCL with the Moon's point mass
    # the rate is -(3 GM_M / (2a))/c^2 = -4.4534e-11 (common practice) within the tides of the
    # Earth and the Sun (below 3e-16); the simultaneity term stays apart from tau - t.
    gm_moon, a_m = 4.902800118e12, 1_837_400.0
    speed, states = math.sqrt(gm_moon / a_m), []
    for t_s in (0, 60, 120, 180):
        angle = speed / a_m * t_s
        states.append(
            {
                "epoch": f"2026-05-20T00:{t_s // 60:02d}:00",
                "position_m": [a_m * math.cos(angle), 0.0, a_m * math.sin(angle)],
                "velocity_m_s": [-speed * math.sin(angle), 0.0, speed * math.cos(angle)],
            }
        )
    lunar = m.EphemerisInput.from_dict(
        {
            "frame": "ICRF",
            "center": "moon",
            "time_scale": "TDB",
            "objects": [{"id": "TERN-9", "states": states}],
        }
    )
    tl = expect(api.call("proper_time", body=lunar, reference=m.ProperTimeReferenceName.TL), 200)
    assert tl.reference == "TL" and any("proposal" in w for w in tl.warnings), tl.warnings
    tcl = expect(
        api.call(
            "proper_time",
            body=lunar,
            reference=m.ProperTimeReferenceName.TCL,
            gravity_model=m.GravityModelName.POINT_MASS,
        ),
        200,
    )
    (tern,) = tcl.objects
    assert tern.frame == "lunar_inertial", tern.frame
    near(tern.summary.mean_rate, -1.5 * gm_moon / (a_m * C_M_S**2), 3e-16, "lunar orbit rate")
    sample = tern.series[-1]
    parts = sample.velocity_part_s + sample.gravity_part_s + sample.tidal_part_s
    near(sample.tau_minus_t_s, parts, 1e-18, "parts")
    assert sample.tidal_part_s == sample.lunar.tidal_part_s != 0.0
    assert sample.lunar.simultaneity_s != 0.0
    # An Earth frame for a Moon-centred ephemeris: 422 naming the field.
    wrong = m.EphemerisInput.from_dict(
        {"frame": "GCRF", "center": "moon", "time_scale": "TDB",
         "objects": [{"id": "TERN-9", "states": states}]}
    )
    expect_problem(api.call("proper_time", body=wrong), 422, "frame_center_mismatch", field="frame")


def csv_rows(response):
    expect(response, 200, "text/csv")
    return list(csv.DictReader(io.StringIO(response.content.decode("utf-8"))))


@operation("rate_profile")
def rate_profile(api, m, document):
    drawn = api.call("rate_profile", points=40)
    expect(drawn, 200, "image/svg+xml")
    svg = drawn.content.decode("utf-8")
    for column in ("total", "velocity_part", "gravity_part"):
        assert f'data-series="{column}"' in svg, column
    # Altitudes chosen so that the first point lies at a = 26 561.75 km (a_E = 6 378 136.6 m,
    # IERS Conventions (2010) table 1.1): the IS-GPS-200 3.3.1.1 offset 4.4647e-10.
    altitude_km = (26_561_750.0 - 6_378_136.6) / 1e3
    rows = csv_rows(
        api.call_accepting(
            "text/csv", "rate_profile", min_altitude_km=altitude_km, max_altitude_km=40_000.0, points=2
        )
    )
    assert len(rows) == 2 and list(rows[0]) == ["altitude_km", "total", "velocity_part", "gravity_part"]
    near(float(rows[0]["total"]), circular_orbit_rate(26_561_750.0), 1e-15, "MEO rate (profile)")
    near(float(rows[0]["total"]), 4.4647e-10, 1e-14, "IS-GPS-200 3.3.1.1 offset (profile)")
    near(float(rows[0]["velocity_part"]) + float(rows[0]["gravity_part"]), float(rows[0]["total"]), 1e-24, "parts add up")
    expect_problem(api.call("rate_profile", points=1), 422, "bad_option", field="points")


@operation("scale_offsets")
def scale_offsets(api, m, document):
    window = {"from_": "2016-12-31", "to": "2017-01-02", "points": 3}
    drawn = api.call("scale_offsets", **window)
    expect(drawn, 200, "image/svg+xml")
    assert 'data-series="tai_minus_utc_s"' in drawn.content.decode("utf-8")
    rows = csv_rows(api.call_accepting("text/csv", "scale_offsets", **window))
    # IERS Bulletin C 52: TAI - UTC = 36 s before 2017-01-01, 37 s from then; TT - TAI = 32.184 s
    # (IAU 1991 A4); GPST = TAI - 19 s (IS-GPS-200), BDT = TAI - 33 s (BeiDou OS ICD).
    by_utc = {row["utc"]: row for row in rows}
    before, after = by_utc["2016-12-31T23:59:59.000"], by_utc["2017-01-01T00:00:00.000"]
    assert (float(before["tai_minus_utc_s"]), float(after["tai_minus_utc_s"])) == (36.0, 37.0)
    near(float(after["tt_minus_tai_s"]), 32.184, 1e-12, "TT - TAI")
    assert (float(after["gpst_minus_utc_s"]), float(after["bdt_minus_utc_s"])) == (18.0, 4.0)
    expect_problem(
        api.call("scale_offsets", from_="2017-01-02", to="2016-12-31"), 422, "bad_option", field="to"
    )


@operation("signal_path")
def signal_path(api, m, document):
    body = m.SignalPathRequest.from_dict(
        {
            "epoch": "2026-03-14T06:30:00",
            "scale": "GPST",
            "receiver": {
                "ground_site": {"latitude_deg": 41.3, "longitude_deg": 14.7, "height_m": 210.0}
            },
            "transmitter": {
                "frame": "ITRF",
                "position_m": [17_000_000.0, 4_500_000.0, 19_500_000.0],
                "velocity_m_s": [-1_900.0, 2_600.0, 1_000.0],
            },
        }
    )
    answer = expect(api.call("signal_path", body=body), 200)
    assert answer.frame == "ITRF", answer.frame
    # Light time = inertial range / c plus the Shapiro delay (IERS Conventions 2010 eq. 11.17).
    near(
        answer.light_time_s,
        answer.inertial_range_m / C_M_S + answer.terms.shapiro.s,
        1e-12,
        "light time",
    )
    # The Sagnac term is the range change from Earth rotation during flight: under 50 m for a
    # satellite at GNSS heights (from memory: at most about 40 m).
    near(answer.inertial_range_m - answer.geometric_range_m, answer.terms.sagnac.m, 1e-3, "Sagnac")
    assert abs(answer.terms.sagnac.m) < 50.0, answer.terms.sagnac


@operation("two_way")
def two_way(api, m, document):
    stations = {"station_a": (41.3, 14.7, 210.0), "station_b": (53.8, 3.1, 15.0)}  # invented
    body = m.TwoWayRequest.from_dict(
        {
            "satellite_longitude_deg": 9.0,
            **{
                name: {"latitude_deg": lat, "longitude_deg": lon, "height_m": h}
                for name, (lat, lon, h) in stations.items()
            },
        }
    )
    answer = expect(api.call("two_way", body=body), 200)
    # Geostationary radius 42 164 km (from memory).
    near(answer.satellite_radius_m, 42_164_000.0, 1_000.0, "geostationary radius")
    lon_rad = math.radians(9.0)
    sat_x_m, sat_y_m = (answer.satellite_radius_m * f(lon_rad) for f in (math.cos, math.sin))
    omega_rad_s = 7.292115e-5  # Earth rotation rate, IERS Conventions 2010 table 1.1
    legs_s = []
    for name, leg_s in (("station_a", answer.leg_a_s), ("station_b", answer.leg_b_s)):
        # Sagnac term of a leg: 2 omega A / c^2, A the signed equatorial-plane area of the
        # triangle geocentre - station - satellite (ITU-R TF.1153).
        x_m, y_m = equatorial_xy_m(*stations[name])
        area_m2 = 0.5 * (x_m * sat_y_m - y_m * sat_x_m)
        near(leg_s, 2.0 * omega_rad_s * area_m2 / C_M_S**2, 1e-15, f"Sagnac leg of {name}")
        legs_s.append(leg_s)
    near(answer.two_way_s, legs_s[0] - legs_s[1], 1e-21, "two_way_s = leg_a_s - leg_b_s")
    assert answer.elevation_a_deg > answer.elevation_b_deg > 0.0, answer


@operation("orientation_get")
def orientation_get(api, m, document):
    answer = expect(
        api.call(
            "orientation_get",
            at="2015-06-29T00:00:00",
            scale=m.ScaleName.UTC,
            format_=m.InstantFormatName.ISO,
            pole_offsets=False,
        ),
        200,
    )
    # pyerfa era00, gst06a at this instant with the IERS EOP 20 C04 values of MJD 57202
    # (tests/reference/orientation_endpoint_erfa.csv, from its seeded script).
    near(answer.ut1_minus_utc_s, -0.6753559, 1e-12, "UT1 - UTC of 2015-06-29 (C04)")
    near(answer.era_rad, 4.8268706507516725, 1e-12, "ERA (pyerfa era00)")
    near(answer.gast_rad, 4.830342314743621, 1e-12, "GAST (pyerfa gst06a)")
    assert answer.eop.status == "observed" and answer.warnings == [], answer
    # A rotation matrix times its transpose is the identity (from memory).
    rows = answer.gcrs_to_itrs
    for i in range(3):
        for j in range(3):
            dot = sum(rows[i][k] * rows[j][k] for k in range(3))
            near(dot, 1.0 if i == j else 0.0, 1e-15, f"M M^T [{i}][{j}]")
    # After the end of the predictions (2027-10-29, src/physics/earth/data/eop_README.md).
    expect_problem(
        api.call("orientation_get", at="2030-01-01T00:00:00"), 422, "eop_after_table", field="at"
    )


@operation("body_state")
def body_state(api, m, document):
    answer = expect(
        api.call(
            "body_state",
            body=m.BodyName.MOON,
            center=m.BodyName.SSB,
            at="0",
            scale=m.ScaleName.TDB,
            format_=m.InstantFormatName.J2000_S,
        ),
        200,
    )
    # JPL DE440 read by jplephem at 2000-01-01T12:00:00 TDB
    # (tests/reference/solar_system_de440.csv, from its seeded script); same records: 1 mm.
    expected = [-27858348867.43948, 132094664320.14929, 57342550799.15141]
    for axis in range(3):
        near(answer.position_m[axis], expected[axis], 1e-3, f"Moon about the SSB, axis {axis}")
    assert answer.frame == "ICRF" and "DE440" in answer.ephemeris.name, answer
    expect_problem(
        api.call("body_state", body=m.BodyName.MOON, at="1900-01-01T00:00:00"),
        422,
        "outside_ephemeris_span",
        field="at",
    )


@operation("orientation_post")
def orientation_post(api, m, document):
    body = m.OrientationBatchRequest.from_dict(
        {"epochs": ["2015-06-29T00:00:00", "2027-09-14T22:40:59.151291754"]}
    )
    batch = expect(api.call("orientation_post", body=body), 200)
    observed, predicted = batch.orientations
    # The built-in table is observed to 2026-10-22 and predicted after it (IERS Bulletin A
    # flags, src/physics/earth/data/eop_README.md); a predicted answer warns with its error.
    assert observed.eop.status == "observed", observed.eop
    assert predicted.eop.status == "predicted", predicted.eop
    assert any("x_p" in w and "mas" in w for w in predicted.warnings), predicted.warnings
    body = m.OrientationBatchRequest.from_dict({"epochs": ["2026-03-14T06:30:00", "1961-01-01"]})
    expect_problem(
        api.call("orientation_post", body=body), 422, "eop_before_table", field="epochs[1]"
    )


@operation("metrics")
def metrics(api, m, document):
    text = expect(api.call("metrics"), 200, "text/plain")
    # Runs last: the server counted a request on every path of the document.
    for path in document["paths"]:
        if path != "/metrics":
            assert f'route="{path}"' in text, f"no request counted on {path}"


# -- the run -----------------------------------------------------------------------------------


class Api:
    """Calls operations through the generated modules, recording which were called."""

    def __init__(self, client, modules):
        self.client = client
        self.modules = modules

    def call(self, operation_id, **arguments):
        CALLED.add(operation_id)
        module = importlib.import_module(self.modules[operation_id])
        return module.sync_detailed(client=self.client, **arguments)

    def call_accepting(self, accept, operation_id, **arguments):
        """The same request, built by the generated module, sent with an `Accept` header (for
        the CSV and SVG forms of an answer); the raw answer (the generated parser reads JSON)."""
        CALLED.add(operation_id)
        module = importlib.import_module(self.modules[operation_id])
        kwargs = module._get_kwargs(**arguments)
        headers = dict(kwargs.pop("headers", {}) or {})
        headers["accept"] = accept
        return self.client.get_httpx_client().request(headers=headers, **kwargs)


def main():
    parser = argparse.ArgumentParser()
    parser.add_argument("--document", required=True)
    parser.add_argument("--client-dir", required=True)
    parser.add_argument("--base-url", required=True)
    arguments = parser.parse_args()
    with open(arguments.document, encoding="utf-8") as file:
        document = json.load(file)
    modules = {}
    for item in document["paths"].values():
        for method, op in item.items():
            if method in ("get", "put", "post", "delete", "patch", "head", "options", "trace"):
                # The generator writes a tag's module in snake case (`solar-system` ->
                # `solar_system`).
                tag = (op.get("tags") or ["default"])[0].replace("-", "_")
                modules[op["operationId"]] = f"eigenzeit_client.api.{tag}.{op['operationId']}"
    missing, stale = sorted(set(modules) - set(CHECKS)), sorted(set(CHECKS) - set(modules))
    if missing or stale:
        print(
            f"client: operations without a check: {missing}; checks without an operation: {stale}"
        )
        return 1
    sys.path.insert(0, arguments.client_dir)
    client_module = importlib.import_module("eigenzeit_client")
    models = importlib.import_module("eigenzeit_client.models")
    client = client_module.Client(
        base_url=arguments.base_url, raise_on_unexpected_status=True, timeout=30.0
    )
    api = Api(client, modules)
    failures = 0
    for operation_id in sorted(CHECKS, key=lambda name: (name == "metrics", name)):
        try:
            CHECKS[operation_id](api, models, document)
            print(f"ok    {operation_id}")
        except Exception as error:  # report every operation, then fail
            failures += 1
            print(f"FAIL  {operation_id}: {type(error).__name__}: {error}")
    uncalled = sorted(set(modules) - CALLED)
    if uncalled:
        print(f"client: operations never called: {uncalled}")
        failures += 1
    print(f"client: {len(modules)} operations, {len(CALLED)} called, {failures} failures")
    return 1 if failures else 0


if __name__ == "__main__":
    sys.exit(main())
