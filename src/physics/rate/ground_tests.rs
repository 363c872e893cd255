use super::*;
use crate::physics::constants::GM_EARTH_M3_S2;
use crate::physics::rate::orbit::keplerian_mean_rate_parts;

fn site(latitude_deg: f64, height: GroundHeight) -> GroundSite {
    GroundSite {
        latitude_deg,
        longitude_deg: 12.5,
        height,
    }
}

fn tt(site: &GroundSite, model: GravityModel) -> RateParts {
    ground_site_rate(site, RateReference::Tt, model).unwrap()
}

#[test]
fn ellipsoid_surface_is_near_w0_with_j2() {
    // IERS Conventions (2010) table 1.1 (W0, J2, GM). The J2 field on the GRS80 ellipsoid
    // differs from W0 by the GRS80 normal potential offset U0 - W0 = 62 636 860.850 -
    // 62 636 856.0 m^2/s^2 (Moritz, GRS80; from memory) and the truncated J4 term,
    // |J4| GM/b ~ 150 m^2/s^2 at the poles (GRS80 J4 = -2.37e-6; from memory): below 2e-15.
    for latitude_deg in [0.0, 30.0, 45.0, 60.0, 90.0, -45.0] {
        let rate = tt(
            &site(latitude_deg, GroundHeight::EllipsoidalM(0.0)),
            GravityModel::J2,
        );
        assert!(
            rate.total().abs() < 2.0e-15,
            "lat {latitude_deg}: {:e}",
            rate.total()
        );
    }
}

#[test]
fn point_mass_misses_the_flattening() {
    // Without J2 the pole and equator of the ellipsoid differ by about J2-sized potential
    // terms (~1e-3 of GM/a, i.e. ~7e-13): the J2 model is needed on the ground (common practice).
    let equator = tt(
        &site(0.0, GroundHeight::EllipsoidalM(0.0)),
        GravityModel::PointMass,
    )
    .total();
    let pole = tt(
        &site(90.0, GroundHeight::EllipsoidalM(0.0)),
        GravityModel::PointMass,
    )
    .total();
    assert!((equator - pole).abs() > 1e-13, "{equator:e} {pole:e}");
}

#[test]
fn height_dependence_is_about_1_09e_16_per_metre_and_higher_runs_faster() {
    // Common practice: g/c^2 ~ 1.09e-16 per metre; higher clocks run faster.
    for height in [
        GroundHeight::EllipsoidalM(1000.0),
        GroundHeight::AboveGeoidM(1000.0),
    ] {
        let low = match height {
            GroundHeight::EllipsoidalM(_) => GroundHeight::EllipsoidalM(0.0),
            GroundHeight::AboveGeoidM(_) => GroundHeight::AboveGeoidM(0.0),
        };
        let per_metre = (tt(&site(45.0, height), GravityModel::J2).total()
            - tt(&site(45.0, low), GravityModel::J2).total())
            / 1000.0;
        assert!(
            (per_metre - 1.09e-16).abs() < 0.005e-16,
            "{height:?}: {per_metre:e}"
        );
    }
}

#[test]
fn geoid_height_zero_is_tt_and_tcg_differs_by_l_g() {
    // Definition of TT (IAU 2000 Resolution B1.9): a clock on the geoid has rate 0 against TT,
    // and -L_G against TCG.
    let on_geoid = site(51.0, GroundHeight::AboveGeoidM(0.0));
    assert!(tt(&on_geoid, GravityModel::J2).total().abs() < 1e-22);
    let tcg = ground_site_rate(&on_geoid, RateReference::Tcg, GravityModel::J2).unwrap();
    assert!((tcg.total() + L_G).abs() < 1e-22);
}

#[test]
fn co_rotating_point_at_geostationary_radius_equals_the_circular_orbit() {
    // Kepler: omega_E^2 a^3 = GM at the geostationary radius, so a point-mass "site" at that
    // radius on the equator moves like the circular orbit (Ashby (2003) eq. (38)).
    let a_m = (GM_EARTH_M3_S2 / (EARTH_ROTATION_RAD_S * EARTH_ROTATION_RAD_S)).cbrt();
    let height_m = a_m - crate::physics::constants::GRS80_SEMI_MAJOR_AXIS_M;
    let rate = tt(
        &site(0.0, GroundHeight::EllipsoidalM(height_m)),
        GravityModel::PointMass,
    );
    let orbit = keplerian_mean_rate_parts(GM_EARTH_M3_S2, a_m, RateReference::Tt);
    assert!((rate.sr - orbit.sr).abs() < 1e-22 && (rate.gr - orbit.gr).abs() < 1e-22);
}

#[test]
fn bad_sites_name_the_field() {
    // Input validation (bounds in geodesy::require_height_m; common practice).
    let cases = [
        (
            GroundSite {
                latitude_deg: 91.0,
                ..site(0.0, GroundHeight::EllipsoidalM(0.0))
            },
            "latitude_deg",
        ),
        (
            GroundSite {
                longitude_deg: f64::NAN,
                ..site(0.0, GroundHeight::EllipsoidalM(0.0))
            },
            "longitude_deg",
        ),
        (site(0.0, GroundHeight::EllipsoidalM(-11_001.0)), "height_m"),
        (
            site(0.0, GroundHeight::AboveGeoidM(f64::INFINITY)),
            "height_m",
        ),
    ];
    for (bad, field) in cases {
        let err = ground_site_rate(&bad, RateReference::Tt, GravityModel::J2).unwrap_err();
        assert_eq!(err.field, field, "{err}");
    }
}

#[test]
fn heights_above_the_geoid_are_exact_up_to_and_beyond_geostationary() {
    // The drop U0 - U from the GRS80 zonal series J2..J8 plus the centrifugal term (Heiskanen &
    // Moritz 1967 eq. 2-92; Moritz 2000 J2n and U0 = 62 636 860.850 m^2/s^2, from memory),
    // computed here independently of the closed form the service uses. The free-air series
    // that stood here before was off by 3.6e-13 at 1000 km and answered +9229 us/day at
    // 36 000 km and 45 deg (independent review, reproduced: the closed form gives +48.874).
    let j2n = [
        0.001_082_63,
        -0.000_002_370_912_22,
        0.000_000_006_083_47,
        -0.000_000_000_014_27,
    ];
    let series_u = |p: [f64; 3]| {
        let r = (p[0] * p[0] + p[1] * p[1] + p[2] * p[2]).sqrt();
        let t = p[2] / r;
        let mut legendre = [1.0, t, 0.0, 0.0, 0.0, 0.0, 0.0, 0.0, 0.0];
        for n in 1..8 {
            let nf = n as f64;
            legendre[n + 1] =
                ((2.0 * nf + 1.0) * t * legendre[n] - nf * legendre[n - 1]) / (nf + 1.0);
        }
        let ratio2 = (crate::physics::constants::GRS80_SEMI_MAJOR_AXIS_M / r).powi(2);
        let (mut bracket, mut power) = (1.0, 1.0);
        for (k, j) in j2n.iter().enumerate() {
            power *= ratio2;
            bracket -= j * power * legendre[2 * k + 2];
        }
        crate::physics::constants::GRS80_GM_M3_S2 / r * bracket
            + 0.5 * EARTH_ROTATION_RAD_S.powi(2) * (p[0] * p[0] + p[1] * p[1])
    };
    for (latitude_deg, height_m) in [(45.0, 1.0e6), (45.0, 3.6e7), (0.0, 35_786e3), (-70.0, 1e8)] {
        let at = site(latitude_deg, GroundHeight::AboveGeoidM(height_m));
        let got = tt(&at, GravityModel::J2).total();
        let position = geodetic_to_ecef_m(latitude_deg, 12.5, height_m).unwrap();
        let expected = (62_636_860.850 - series_u(position)) / SPEED_OF_LIGHT_SQUARED_M2_S2;
        assert!(
            (got - expected).abs() < 1e-20,
            "lat {latitude_deg} h {height_m}: {got:e} vs {expected:e}"
        );
    }
    let geo_45 = tt(
        &site(45.0, GroundHeight::AboveGeoidM(3.6e7)),
        GravityModel::J2,
    )
    .total();
    assert!(
        (geo_45 * 86_400e6 - 48.874).abs() < 1e-3,
        "{}",
        geo_45 * 86_400e6
    );
}
