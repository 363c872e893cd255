//! The Moon's own potential for orbiting clocks: point mass plus the zonal J2 term about the
//! lunar pole, and the range of selenocentric positions the model takes.

use crate::physics::solar_system::gm::GM_MOON_M3_S2;

/// J2 of the Moon (unnormalized), 2.0330e-4, with its reference radius [`MOON_J2_RADIUS_M`]:
/// the GRAIL lunar gravity field GL0660B (Konopliv et al. 2014), value from memory.
pub const MOON_J2: f64 = 2.0330e-4;

/// The reference radius of [`MOON_J2`], m (1738.0 km, GL0660B, from memory).
pub const MOON_J2_RADIUS_M: f64 = 1_738_000.0;

/// The farthest selenocentric distance taken, m: 60 000 km, just inside the Moon's Hill
/// sphere (a (m_M / 3 M_E)^(1/3) = 384 400 km x 0.16 = 61 500 km, common practice). Beyond it
/// the Earth's field is no longer a small tide about the Moon and the LCRS is not a sensible
/// frame for the clock.
pub const MAX_SELENOCENTRIC_DISTANCE_M: f64 = 6.0e7;

/// The direction of the Moon's north pole in ICRF axes at a TDB epoch.
#[derive(Debug, Clone, Copy, PartialEq)]
pub struct LunarPole {
    /// Unit vector of the pole, ICRF axes.
    pub unit: [f64; 3],
}

impl LunarPole {
    /// The pole at `tdb_s` TDB seconds since J2000.0 from the IAU WGCCRE model (Archinal et
    /// al. 2018, Celest. Mech. Dyn. Astr. 130:22, table for the Moon; the secular terms and
    /// the periodic terms in E1 to E4, from memory):
    ///
    /// alpha0 = 269.9949 + 0.0031 T - 3.8787 sin E1 - 0.1204 sin E2 + 0.0700 sin E3
    ///          - 0.0172 sin E4 (degrees),
    /// delta0 = 66.5392 + 0.0130 T + 1.5419 cos E1 + 0.0239 cos E2 - 0.0278 cos E3
    ///          + 0.0068 cos E4,
    ///
    /// E1 = 125.045 - 0.0529921 d, E2 = 250.089 - 0.1059842 d, E3 = 260.008 + 13.0120009 d,
    /// E4 = 176.625 + 13.3407154 d (d days, T Julian centuries since J2000.0 TDB). The terms
    /// left out are below 0.01 degree; a 0.01 degree pole error changes the J2 potential of a
    /// 100 km orbit by below 1e-18 of rate.
    pub fn at_tdb_s(tdb_s: f64) -> Self {
        let d = tdb_s / 86_400.0;
        let t = d / 36_525.0;
        let e1 = (125.045 - 0.052_992_1 * d).to_radians();
        let e2 = (250.089 - 0.105_984_2 * d).to_radians();
        let e3 = (260.008 + 13.012_000_9 * d).to_radians();
        let e4 = (176.625 + 13.340_715_4 * d).to_radians();
        let alpha = (269.9949 + 0.0031 * t - 3.8787 * e1.sin() - 0.1204 * e2.sin()
            + 0.0700 * e3.sin()
            - 0.0172 * e4.sin())
        .to_radians();
        let delta = (66.5392 + 0.0130 * t + 1.5419 * e1.cos() + 0.0239 * e2.cos()
            - 0.0278 * e3.cos()
            + 0.0068 * e4.cos())
        .to_radians();
        Self {
            unit: [
                delta.cos() * alpha.cos(),
                delta.cos() * alpha.sin(),
                delta.sin(),
            ],
        }
    }
}

/// The Moon's potential at selenocentric `position_m` (ICRF axes, m), m^2/s^2, positive (the
/// IERS sign convention of U): point mass and zonal J2,
///
/// U = GM_M / r [1 - J2 (R/r)^2 P2(sin phi)], P2(s) = (3 s^2 - 1)/2,
///
/// phi the selenocentric latitude from `pole` (the standard zonal expansion, e.g. Kaula,
/// Theory of Satellite Geodesy (1966) eq. 1.31 truncated at degree 2; sign with J2 = -C20).
/// GM_M of DE440 (Park et al. 2021). `j2` selects the J2 term (false: point mass only).
pub fn moon_potential_m2_s2(position_m: &[f64; 3], pole: &LunarPole, j2: bool) -> f64 {
    let r2 = position_m[0] * position_m[0]
        + position_m[1] * position_m[1]
        + position_m[2] * position_m[2];
    let r = r2.sqrt();
    let point = GM_MOON_M3_S2 / r;
    if !j2 {
        return point;
    }
    let z =
        position_m[0] * pole.unit[0] + position_m[1] * pole.unit[1] + position_m[2] * pole.unit[2];
    let sin2 = z * z / r2;
    point * (1.0 - MOON_J2 * MOON_J2_RADIUS_M * MOON_J2_RADIUS_M / r2 * 0.5 * (3.0 * sin2 - 1.0))
}

/// Refuses a selenocentric distance (m) of an orbiting clock below the Moon's mean radius
/// (1 737 400 m, IAU WGCCRE, Archinal et al. 2018): (`below_surface`, message); or beyond
/// [`MAX_SELENOCENTRIC_DISTANCE_M`]: (`beyond_model_range`, message).
pub fn check_orbit_distance(radius_m: f64) -> Result<(), (&'static str, String)> {
    if radius_m < crate::physics::constants::MOON_MEAN_RADIUS_M {
        return Err((
            "below_surface",
            format!("the selenocentric distance is {radius_m:.1} m, below the Moon's mean radius (1 737 400 m); positions must be Moon-centred and in metres"),
        ));
    }
    if radius_m > MAX_SELENOCENTRIC_DISTANCE_M {
        return Err((
            "beyond_model_range",
            format!("the selenocentric distance is {radius_m:.4e} m, beyond 6e7 m (60 000 km, inside the Moon's Hill sphere of about 61 500 km), where the Earth's field is no longer a small tide about the Moon"),
        ));
    }
    Ok(())
}
