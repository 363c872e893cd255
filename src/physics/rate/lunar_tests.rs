use super::*;
use crate::physics::constants::SPEED_OF_LIGHT_SQUARED_M2_S2;
use crate::physics::gravity::norm;

fn site(latitude_deg: f64, longitude_deg: f64) -> LunarSite {
    LunarSite {
        latitude_deg,
        longitude_deg,
        height_m: 0.0,
    }
}

#[test]
fn lunar_surface_clock_gains_about_56_us_per_day_against_tt() {
    // Ashby & Patla (2024), Astron. J. 168, 112: about +56 us/day (56.02; from memory);
    // range +56 to +57 us/day as widely reported (from memory).
    for (lat, lon) in [(0.0, 0.0), (0.0, 180.0), (-89.5, 0.0), (26.1, 3.6)] {
        let us = lunar_site_rate(&site(lat, lon), RateReference::Tt)
            .unwrap()
            .to_microseconds_per_day();
        assert!(us.total > 56.0 && us.total < 57.0, "({lat}, {lon}): {us:?}");
    }
}

#[test]
fn geometry_sub_earth_point_faces_the_earth_and_moves_slowest() {
    // IAU mean-Earth system (Archinal et al. 2011): longitude 0 faces the Earth; with
    // synchronous rotation the near side moves at n (D - R) and the far side at n (D + R).
    let (near, near_v) = lunar_site_geocentric_state(&site(0.0, 0.0)).unwrap();
    let (far, far_v) = lunar_site_geocentric_state(&site(0.0, 180.0)).unwrap();
    assert!((norm(near) - (EARTH_MOON_MEAN_DISTANCE_M - MOON_MEAN_RADIUS_M)).abs() < 1e-6);
    assert!((norm(far) - (EARTH_MOON_MEAN_DISTANCE_M + MOON_MEAN_RADIUS_M)).abs() < 1e-6);
    let spin = MOON_ROTATION_RAD_S * MOON_MEAN_RADIUS_M;
    assert!((norm(far_v) - norm(near_v) - 2.0 * spin).abs() < 1e-9);
}

#[test]
fn moon_self_potential_dominates_and_tidal_correction_is_small() {
    // Decomposition of IERS Conventions (2010) eq. 10.6 at the sub-Earth point: the Moon's
    // own potential GM_M/R is 2.82e6 m^2/s^2 (DE430 GM, IAU radius); raising the site by 1 km
    // reduces U by about g_Moon * 1 km = 1.62e3 m^2/s^2 (lunar surface gravity 1.62 m/s^2,
    // common practice), i.e. the clock gains about 1.8e-14 (0.0016 us/day) per km.
    let low = lunar_site_rate(&site(10.0, 20.0), RateReference::Tt)
        .unwrap()
        .total();
    let high = lunar_site_rate(
        &LunarSite {
            height_m: 1000.0,
            ..site(10.0, 20.0)
        },
        RateReference::Tt,
    )
    .unwrap()
    .total();
    let per_km = (high - low) * SPEED_OF_LIGHT_SQUARED_M2_S2;
    assert!((per_km - 1.62e3).abs() < 0.05e3, "{per_km}");
}

#[test]
fn bad_lunar_sites_name_the_field() {
    // Input validation (bounds documented on LunarSite; common practice).
    let cases = [
        (
            LunarSite {
                latitude_deg: -90.1,
                ..site(0.0, 0.0)
            },
            "latitude_deg",
        ),
        (
            LunarSite {
                longitude_deg: f64::NEG_INFINITY,
                ..site(0.0, 0.0)
            },
            "longitude_deg",
        ),
        (
            LunarSite {
                height_m: f64::NAN,
                ..site(0.0, 0.0)
            },
            "height_m",
        ),
        (
            LunarSite {
                height_m: 200_000.0,
                ..site(0.0, 0.0)
            },
            "height_m",
        ),
        (
            LunarSite {
                height_m: -12_000.0,
                ..site(0.0, 0.0)
            },
            "height_m",
        ),
    ];
    for (bad, field) in cases {
        assert_eq!(
            lunar_site_rate(&bad, RateReference::Tt).unwrap_err().field,
            field
        );
    }
}
