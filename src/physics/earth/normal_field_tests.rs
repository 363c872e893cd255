use super::*;
use crate::physics::constants::GRS80_NORMAL_GRAVITY_EQUATOR_M_S2 as GAMMA_E;
use crate::physics::constants::GRS80_NORMAL_GRAVITY_POLE_M_S2 as GAMMA_P;

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

/// Legendre polynomials P2, P4, P6, P8 of t (common practice: Bonnet's recursion).
fn legendre_even(t: f64) -> [f64; 4] {
    let mut p = [1.0, t, 0.0, 0.0, 0.0, 0.0, 0.0, 0.0, 0.0];
    for n in 1..8 {
        let nf = n as f64;
        p[n + 1] = ((2.0 * nf + 1.0) * t * p[n] - nf * p[n - 1]) / (nf + 1.0);
    }
    [p[2], p[4], p[6], p[8]]
}

/// The same normal potential from the spherical-harmonic series of the GRS80 zonal terms plus
/// the centrifugal potential (Heiskanen & Moritz 1967 eq. 2-92 and 2-89; Moritz 2000 J2n).
fn series_potential_m2_s2(position_m: [f64; 3]) -> f64 {
    let [x, y, z] = position_m;
    let r = (x * x + y * y + z * z).sqrt();
    let p = legendre_even(z / r);
    let ratio2 = (GRS80_SEMI_MAJOR_AXIS_M / r).powi(2);
    let mut bracket = 1.0;
    let mut power = 1.0;
    for (j, pn) in J2N_GRS80.iter().zip(p) {
        power *= ratio2;
        bracket -= j * power * pn;
    }
    GRS80_GM_M3_S2 / r * bracket + 0.5 * EARTH_ROTATION_RAD_S.powi(2) * (x * x + y * y)
}

#[test]
fn the_ellipsoid_is_the_level_surface_u0() {
    // Moritz 2000: U0 = 62 636 860.850 m^2/s^2 (from memory), at every latitude.
    for latitude_deg in [0.0, 15.0, 30.0, 45.0, 60.0, 75.0, 89.0, 90.0, -45.0] {
        let position = geodetic_to_ecef_m(latitude_deg, 33.0, 0.0).unwrap();
        let u = grs80_normal_potential_m2_s2(position).unwrap();
        assert!((u - U0_GRS80_M2_S2).abs() < 2e-3, "lat {latitude_deg}: {u}");
    }
}

#[test]
fn linear_eccentricity_is_the_published_one() {
    // Moritz 2000: E = 521 854.0097 m (from memory).
    assert!((grs80_linear_eccentricity_m() - 521_854.009_7).abs() < 1e-3);
}

#[test]
fn gradient_at_equator_and_pole_is_the_published_normal_gravity() {
    // Moritz 2000: gamma_e = 9.780 326 7715, gamma_p = 9.832 186 3685 m/s^2 (derived
    // constants), as the derivative of U along the normal (central difference, +-10 m).
    let a = GRS80_SEMI_MAJOR_AXIS_M;
    let b = GRS80_SEMI_MINOR_AXIS_M;
    let step = 10.0;
    let u = |p: [f64; 3]| grs80_normal_potential_m2_s2(p).unwrap();
    let gamma_e = (u([a - step, 0.0, 0.0]) - u([a + step, 0.0, 0.0])) / (2.0 * step);
    let gamma_p = (u([0.0, 0.0, b - step]) - u([0.0, 0.0, b + step])) / (2.0 * step);
    assert!((gamma_e - GAMMA_E).abs() < 2e-9, "{gamma_e}");
    assert!((gamma_p - GAMMA_P).abs() < 2e-9, "{gamma_p}");
}

#[test]
fn closed_form_equals_the_zonal_series_from_the_ground_to_beyond_geo() {
    // Heiskanen & Moritz (1967) eq. 2-92 with Moritz 2000 J2..J8: the truncated J10 term is
    // below 1e-5 m^2/s^2 at the surface and shrinks as (a/r)^10 above it.
    for (latitude_deg, height_m, tolerance) in [
        (0.0, 0.0, 1e-4),
        (45.0, 0.0, 1e-4),
        (90.0, 0.0, 1e-4),
        (30.0, 400e3, 1e-5),
        (60.0, 20_200e3, 1e-6),
        (45.0, 35_786e3, 1e-6),
        (-10.0, 1e8, 1e-6),
    ] {
        let position = geodetic_to_ecef_m(latitude_deg, -20.0, height_m).unwrap();
        let closed = grs80_normal_potential_m2_s2(position).unwrap();
        let series = series_potential_m2_s2(position);
        assert!(
            (closed - series).abs() < tolerance,
            "lat {latitude_deg} h {height_m}: {closed} vs {series}"
        );
    }
}

#[test]
fn near_the_ground_the_drop_is_the_free_air_series() {
    // Heiskanen & Moritz (1967) eq. 2-215 (second order in h/a): its truncation is below
    // gamma h (h/a)^3, 4e-5 m^2/s^2 at 1 km.
    for latitude_deg in [0.0_f64, 45.0, 90.0] {
        let sin_sq = latitude_deg.to_radians().sin().powi(2);
        let gamma = crate::physics::geodesy::normal_gravity_m_s2(latitude_deg).unwrap();
        let f = crate::physics::constants::GRS80_FLATTENING;
        let a = GRS80_SEMI_MAJOR_AXIS_M;
        let m = EARTH_ROTATION_RAD_S.powi(2) * a * a * GRS80_SEMI_MINOR_AXIS_M / GRS80_GM_M3_S2;
        for h in [1.0, 100.0, 1000.0] {
            let series =
                gamma * h * (1.0 - (1.0 + f + m - 2.0 * f * sin_sq) * h / a + (h / a).powi(2));
            let exact = grs80_normal_potential_drop_m2_s2(latitude_deg, h).unwrap();
            assert!(
                (exact - series).abs() < 1e-4,
                "lat {latitude_deg} h {h}: {exact} {series}"
            );
        }
    }
}

#[test]
fn q_series_matches_the_closed_form_where_both_are_accurate() {
    // Heiskanen & Moritz (1967) eq. 2-57, evaluated directly at x = 0.25 and 0.3 (the series' side of its switch), where its
    // cancellation (terms of about 6 for a result of 0.015) costs only about 1e-15 absolute.
    for x in [0.25_f64, 0.3] {
        let closed = 0.5 * ((1.0 + 3.0 / (x * x)) * x.atan() - 3.0 / x);
        let series = level_ellipsoid_q(x);
        assert!(
            (series - closed).abs() < 1e-14,
            "x {x}: {series:e} vs {closed:e}"
        );
    }
}

#[test]
fn points_at_the_centre_are_refused() {
    assert!(grs80_normal_potential_m2_s2([1000.0, 0.0, 0.0]).is_err());
    assert!(grs80_normal_potential_m2_s2([f64::NAN, 0.0, 0.0]).is_err());
}

#[test]
fn normal_potential_drop_is_about_g_h_with_free_air_gradient() {
    // Free-air gradient about 3.086e-6 s^-2 (Heiskanen & Moritz 1967; common practice):
    // W0 - W(1000 m) = gamma*1000 - 0.5*3.086e-6*1000^2 within 0.01 m^2/s^2.
    let drop = grs80_normal_potential_drop_m2_s2(45.0, 1000.0).unwrap();
    let approx = crate::physics::geodesy::normal_gravity_m_s2(45.0).unwrap() * 1000.0
        - 0.5 * 3.086e-6 * 1.0e6;
    assert!((drop - approx).abs() < 0.01, "{drop} vs {approx}");
}

#[test]
fn a_height_that_is_not_a_number_is_refused_naming_height_m() {
    assert_eq!(
        grs80_normal_potential_drop_m2_s2(0.0, f64::NAN)
            .unwrap_err()
            .field,
        "height_m"
    );
}

#[test]
fn the_far_field_has_the_defining_j2_of_grs80() {
    // Moritz 2000: J2 = 108 263e-8 is a defining constant of GRS80 (the closed form is built
    // from a, f, GM, omega; f = 1/298.257 222 101 is derived from J2 there). From the potential:
    // V(equator) - V(pole) = GM/r (1.5 J2 (a/r)^2 + 0.625 J4 (a/r)^4 + ...) at r = 1e8 m
    // (Heiskanen & Moritz 1967 eq. 2-92 with P2(0) - P2(1) = -1.5 and P4(0) - P4(1) = -0.625),
    // with Moritz 2000 J4; the J6 term is below 1e-13 of J2 there.
    let r = 1.0e8;
    let v = |p: [f64; 3]| grs80_normal_gravitational_potential_m2_s2(p).unwrap();
    let ratio2 = (GRS80_SEMI_MAJOR_AXIS_M / r).powi(2);
    let scaled = (v([r, 0.0, 0.0]) - v([0.0, 0.0, r])) * r / GRS80_GM_M3_S2;
    let j2 = (scaled - 0.625 * J2N_GRS80[1] * ratio2 * ratio2) / (1.5 * ratio2);
    assert!((j2 - 0.001_082_63).abs() < 1e-12, "J2 = {j2:e}");
}

#[test]
fn the_gravitational_part_is_the_normal_potential_less_the_centrifugal_one() {
    // Heiskanen & Moritz (1967) eq. 2-37 (from memory): U = V + omega^2 (x^2 + y^2)/2; at the pole the
    // centrifugal term vanishes.
    let pole = [0.0, 0.0, GRS80_SEMI_MINOR_AXIS_M];
    let equator = [GRS80_SEMI_MAJOR_AXIS_M, 0.0, 0.0];
    let u = |p| grs80_normal_potential_m2_s2(p).unwrap();
    let v = |p| grs80_normal_gravitational_potential_m2_s2(p).unwrap();
    assert_eq!(u(pole), v(pole));
    let phi = 0.5 * (EARTH_ROTATION_RAD_S * GRS80_SEMI_MAJOR_AXIS_M).powi(2);
    assert!((u(equator) - v(equator) - phi).abs() < 1e-8);
}
