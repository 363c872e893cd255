//! Ground sites with the GRS80 normal field in closed form (the default for ellipsoidal
//! heights), checked against the published GRS80 constants and an independent zonal series.

use super::*;
use crate::physics::constants::{
    GRS80_GM_M3_S2, GRS80_NORMAL_GRAVITY_EQUATOR_M_S2, GRS80_NORMAL_GRAVITY_POLE_M_S2,
    GRS80_SEMI_MAJOR_AXIS_M, W0_M2_S2,
};
use crate::physics::rate::state::{state_rate, StateVector};
use crate::physics::rate::Frame;

/// GRS80 U0, m^2/s^2 (Moritz, Geodetic Reference System 1980, J. Geodesy 74 (2000), derived
/// constants; from memory).
const U0_GRS80_M2_S2: f64 = 62_636_860.850;

/// GRS80 zonal harmonics J2..J8 (Moritz 2000, defining J2 and derived J4, J6, J8; from memory).
const J2N_GRS80: [f64; 4] = [
    0.001_082_63,
    -0.000_002_370_912_22,
    0.000_000_006_083_47,
    -0.000_000_000_014_27,
];

/// The GRS80 normal potential U from its zonal series J2..J8 plus the centrifugal term
/// (Heiskanen & Moritz 1967 eqs. 2-92 and 2-89), independent of the closed form.
fn series_u_m2_s2(p: [f64; 3]) -> f64 {
    let r = (p[0] * p[0] + p[1] * p[1] + p[2] * p[2]).sqrt();
    let t = p[2] / r;
    let mut legendre = [1.0, t, 0.0, 0.0, 0.0, 0.0, 0.0, 0.0, 0.0];
    for n in 1..8 {
        let nf = n as f64;
        legendre[n + 1] = ((2.0 * nf + 1.0) * t * legendre[n] - nf * legendre[n - 1]) / (nf + 1.0);
    }
    let ratio2 = (GRS80_SEMI_MAJOR_AXIS_M / r).powi(2);
    let (mut bracket, mut power) = (1.0, 1.0);
    for (k, j) in J2N_GRS80.iter().enumerate() {
        power *= ratio2;
        bracket -= j * power * legendre[2 * k + 2];
    }
    GRS80_GM_M3_S2 / r * bracket + 0.5 * EARTH_ROTATION_RAD_S.powi(2) * (p[0] * p[0] + p[1] * p[1])
}

fn site(latitude_deg: f64, height: GroundHeight) -> GroundSite {
    GroundSite {
        latitude_deg,
        longitude_deg: -47.25,
        height,
    }
}

fn rate(latitude_deg: f64, height: GroundHeight, model: GravityModel) -> RateParts {
    ground_site_rate(&site(latitude_deg, height), RateReference::Tt, model).unwrap()
}

#[test]
fn on_the_ellipsoid_the_rate_is_that_of_the_level_surface_u0() {
    // Moritz 2000: the ellipsoid is the level surface U = U0 = 62 636 860.850 m^2/s^2, taken as
    // the geoid (N = 0), so the rate against TT is 0 at every latitude (IAU 2000 Resolution
    // B1.9). 2e-3 m^2/s^2 is the rounding of the published U0; 1e-9 m^2/s^2 that of a double.
    for latitude_deg in [0.0, 15.0, 30.0, 45.0, 60.0, 75.0, 89.5, 90.0, -30.0, -90.0] {
        let parts = rate(
            latitude_deg,
            GroundHeight::EllipsoidalM(0.0),
            GravityModel::Grs80,
        );
        assert!(
            parts.total().abs() < 2e-3 / SPEED_OF_LIGHT_SQUARED_M2_S2,
            "lat {latitude_deg}: {:e}",
            parts.total()
        );
    }
}

#[test]
fn ellipsoidal_heights_follow_the_zonal_series_of_grs80() {
    // U0 - U(x) from Moritz 2000 U0 and J2..J8 (Heiskanen & Moritz 1967 eq. 2-92), computed
    // independently of the closed form: the truncated J10 term is below 1e-4 m^2/s^2 on the
    // ground (1e-21 of rate) and U0 is published to 1e-3 m^2/s^2.
    for (latitude_deg, height_m) in [
        (0.0, 0.0),
        (45.0, 0.0),
        (90.0, 0.0),
        (45.0, 1000.0),
        (-30.0, 8848.0),
        (60.0, -400.0),
        (10.0, 100e3),
        (45.0, 20_200e3),
        (0.0, 1e8),
    ] {
        let got = rate(
            latitude_deg,
            GroundHeight::EllipsoidalM(height_m),
            GravityModel::Grs80,
        );
        let position = geodetic_to_ecef_m(latitude_deg, -47.25, height_m).unwrap();
        let expected = (U0_GRS80_M2_S2 - series_u_m2_s2(position)) / SPEED_OF_LIGHT_SQUARED_M2_S2;
        assert!(
            (got.total() - expected).abs() < 2.5e-20,
            "lat {latitude_deg} h {height_m}: {:e} vs {expected:e}",
            got.total()
        );
    }
}

#[test]
fn the_rate_gradient_is_the_published_normal_gravity() {
    // Moritz 2000: gamma_e = 9.780 326 7715 m/s^2, gamma_p = 9.832 186 3685 m/s^2, here as
    // c^2 d(rate)/dh on the ellipsoid (central difference over +-10 m; the difference's
    // curvature error is gamma (h/a)^2-sized, 2e-11, and its rounding about 1e-9).
    for (latitude_deg, gamma) in [
        (0.0, GRS80_NORMAL_GRAVITY_EQUATOR_M_S2),
        (90.0, GRS80_NORMAL_GRAVITY_POLE_M_S2),
        (-90.0, GRS80_NORMAL_GRAVITY_POLE_M_S2),
    ] {
        let at = |h: f64| {
            rate(
                latitude_deg,
                GroundHeight::EllipsoidalM(h),
                GravityModel::Grs80,
            )
        };
        let gradient = (at(10.0).total() - at(-10.0).total()) / 20.0 * SPEED_OF_LIGHT_SQUARED_M2_S2;
        assert!(
            (gradient - gamma).abs() < 2e-9,
            "lat {latitude_deg}: {gradient}"
        );
    }
}

#[test]
fn an_ellipsoidal_height_equals_the_same_geoid_height_when_n_is_zero() {
    // With geoid undulation N = 0 the orthometric and ellipsoidal heights agree (Heiskanen &
    // Moritz 1967 eq. 4-24, h = H + N; from memory), and so must the rates.
    for (latitude_deg, height_m) in [(0.0, 0.0), (45.0, 1000.0), (-70.0, 100e3), (30.0, 1e8)] {
        let ellipsoidal = rate(
            latitude_deg,
            GroundHeight::EllipsoidalM(height_m),
            GravityModel::Grs80,
        );
        let geoid = rate(
            latitude_deg,
            GroundHeight::AboveGeoidM(height_m),
            GravityModel::Grs80,
        );
        assert!((ellipsoidal.sr - geoid.sr).abs() < 1e-24);
        assert!(
            (ellipsoidal.total() - geoid.total()).abs() < 1e-24,
            "lat {latitude_deg} h {height_m}"
        );
    }
}

#[test]
fn j2_misses_the_normal_field_by_the_reviewed_amounts() {
    // The independent review's figures against the closed form with no disturbing potential,
    // (W0 - U)/c^2: +7.2e-16 at the equator, -5.8e-16 at 45 deg, +1.78e-15 at the poles. With
    // N = 0 (the service) the reference is (U0 - U)/c^2 instead, (U0 - W0)/c^2 = 4.85/c^2 =
    // 5.4e-17 above it (Moritz 2000 U0; IERS Conventions (2010) table 1.1 W0).
    let offset = (U0_GRS80_M2_S2 - W0_M2_S2) / SPEED_OF_LIGHT_SQUARED_M2_S2;
    for (latitude_deg, review) in [(0.0, 7.2e-16), (45.0, -5.8e-16), (90.0, 1.78e-15)] {
        let j2 = rate(
            latitude_deg,
            GroundHeight::EllipsoidalM(0.0),
            GravityModel::J2,
        );
        let grs80 = rate(
            latitude_deg,
            GroundHeight::EllipsoidalM(0.0),
            GravityModel::Grs80,
        );
        let difference = j2.total() - (grs80.total() - offset);
        println!(
            "lat {latitude_deg}: j2 - closed form (T = 0) = {difference:.3e}; j2 - grs80 (N = 0) = {:.3e}",
            j2.total() - grs80.total()
        );
        assert!(
            (difference - review).abs() < 0.06e-16,
            "lat {latitude_deg}: {difference:e}"
        );
    }
}

#[test]
fn a_state_at_rest_on_the_ellipsoid_with_grs80_sees_w0_minus_u0() {
    // A state vector uses the normal field with no disturbing potential (T = 0): at rest on the
    // ellipsoid its rate is (W0 - U0)/c^2 = (62 636 856.0 - 62 636 860.850)/c^2 = -5.40e-17
    // (IERS Conventions (2010) table 1.1 W0; Moritz 2000 U0). The GRS80 GM is used, so the
    // published U0 holds to its rounding.
    for latitude_deg in [0.0, 45.0, 90.0] {
        let position_m = geodetic_to_ecef_m(latitude_deg, 10.0, 0.0).unwrap();
        let state = StateVector {
            frame: Frame::Itrf,
            position_m,
            velocity_m_s: [0.0; 3],
        };
        let parts = state_rate(&state, RateReference::Tt, GravityModel::Grs80)
            .unwrap()
            .parts;
        let expected =
            (L_G * SPEED_OF_LIGHT_SQUARED_M2_S2 - U0_GRS80_M2_S2) / SPEED_OF_LIGHT_SQUARED_M2_S2;
        assert!(
            (parts.total() - expected).abs() < 3e-3 / SPEED_OF_LIGHT_SQUARED_M2_S2,
            "lat {latitude_deg}: {:e} vs {expected:e}",
            parts.total()
        );
    }
}

#[test]
fn geoid_heights_are_exact_at_1_km_100_km_and_the_upper_bound_and_refused_above() {
    // The closed form against the zonal series (as above; Moritz 2000) at 1 km, 100 km and the
    // largest accepted height, 1e8 m; above it a 422-kind error naming height_m
    // (geodesy::require_height_m).
    for height_m in [1000.0, 100e3, crate::physics::geodesy::MAX_SITE_HEIGHT_M] {
        for latitude_deg in [0.0, 45.0, 90.0] {
            let got = rate(
                latitude_deg,
                GroundHeight::AboveGeoidM(height_m),
                GravityModel::J2,
            );
            let position = geodetic_to_ecef_m(latitude_deg, -47.25, height_m).unwrap();
            let expected =
                (U0_GRS80_M2_S2 - series_u_m2_s2(position)) / SPEED_OF_LIGHT_SQUARED_M2_S2;
            assert!(
                (got.total() - expected).abs() < 2.5e-20,
                "lat {latitude_deg} h {height_m}: {:e} vs {expected:e}",
                got.total()
            );
        }
    }
    let above = site(0.0, GroundHeight::AboveGeoidM(1.0e8 + 1.0));
    let err = ground_site_rate(&above, RateReference::Tt, GravityModel::Grs80).unwrap_err();
    assert_eq!(err.field, "height_m");
    assert_eq!(
        err.kind,
        crate::physics::rate_error::RateErrorKind::BeyondModelRange
    );
}
