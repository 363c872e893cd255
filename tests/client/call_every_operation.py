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
import importlib
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
            reference=m.ReferenceName.TT,
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
                tag = (op.get("tags") or ["default"])[0]
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
