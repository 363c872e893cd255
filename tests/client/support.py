"""Helpers of call_every_operation.py: answer checks and the geometry of the invented clocks."""

import math

C_M_S = 299_792_458.0  # speed of light, exact (SI definition of the metre)
GM_EARTH_M3_S2 = 3.986004418e14  # IERS Conventions 2010, table 1.1
L_G = 6.969290134e-10  # 1 - d(TT)/d(TCG), IAU 2000 Resolution B1.9
PROBLEM_JSON = "application/problem+json"


def expect(response, status, content_type="application/json"):
    """The parsed answer, after checking its status and content type."""
    body = response.content.decode("utf-8", "replace")[:600]
    assert response.status_code == status, f"status {response.status_code}, wanted {status}: {body}"
    if content_type is not None:
        got = response.headers.get("content-type", "")
        assert got.startswith(content_type), f"content type {got!r}, wanted {content_type}"
    return getattr(response, "parsed", None)  # raw httpx answers (CSV, SVG) have none


def near(value, expected, tolerance, what):
    assert abs(value - expected) <= tolerance, (
        f"{what}: {value!r}, wanted {expected!r} +- {tolerance}"
    )


def expect_problem(response, status, code, **fields):
    """A problem answer (RFC 9457) with its stable code and the fields naming the fault."""
    problem = expect(response, status, PROBLEM_JSON)
    assert problem.code == code, f"code {problem.code!r}, wanted {code!r}: {problem.detail}"
    assert problem.status == status
    for name, value in fields.items():
        assert getattr(problem, name) == value, (
            f"{name} {getattr(problem, name)!r}, wanted {value!r}"
        )


def by_scale(results):
    return {result.scale: result for result in results}


def circular_orbit_rate(a_m):
    """Fractional rate against TT of a clock on a circular orbit, point-mass Earth:
    L_G - 3GM/(2ac^2) (IS-GPS-200 20.3.3.3.3.1 with IAU 2000 B1.9; for a = 26 561.75 km the
    4.4647e-10 of IS-GPS-200 3.3.1.1)."""
    return L_G - 1.5 * GM_EARTH_M3_S2 / (a_m * C_M_S**2)


def circular_states(radius_m, epochs_s):
    """States on an invented circular equatorial orbit, GCRF, point-mass Earth."""
    speed_m_s = math.sqrt(GM_EARTH_M3_S2 / radius_m)
    rate_rad_s = speed_m_s / radius_m
    states = []
    for t_s in epochs_s:
        angle = rate_rad_s * t_s
        states.append(
            {
                "epoch": f"2026-05-20T00:{t_s // 60:02d}:{t_s % 60:02d}",
                "position_m": [radius_m * math.cos(angle), radius_m * math.sin(angle), 0.0],
                "velocity_m_s": [-speed_m_s * math.sin(angle), speed_m_s * math.cos(angle), 0.0],
            }
        )
    return states


def equatorial_xy_m(latitude_deg, longitude_deg, height_m):
    """Equatorial-plane ITRF coordinates of a geodetic point on the WGS 84 ellipsoid
    (NIMA TR8350.2, eq. 4-14)."""
    a_m, f = 6_378_137.0, 1.0 / 298.257223563
    e2 = f * (2.0 - f)
    lat, lon = math.radians(latitude_deg), math.radians(longitude_deg)
    n_m = a_m / math.sqrt(1.0 - e2 * math.sin(lat) ** 2)
    return (
        (n_m + height_m) * math.cos(lat) * math.cos(lon),
        (n_m + height_m) * math.cos(lat) * math.sin(lon),
    )
