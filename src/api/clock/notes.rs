//! The model notes sent with each answer: the approximations behind it, in words. They restate
//! what the rate library documents (see `src/physics/rate/`).

use crate::physics::gravity::GravityModel;

/// Common to every answer.
const FIRST_ORDER: &str = "first post-Newtonian order, d(tau)/dt - 1 = -(v^2/2 + U)/c^2 (+ L_G against TT), IERS Conventions (2010) eq. 10.6; total = sr + gr, the 1/(1 - L_G) factor and 1/c^4 terms (about 1e-18) are not included";

/// An orbit item when the request (not the item) asked for J2.
pub const ORBIT_REQUEST_J2: &str = "the request-level gravity_model j2 does not apply to orbit mean rates (the J2 average depends on the definition of a and e at the level of the J2 effect); point_mass used: give a state vector for J2";

/// Notes for a state vector.
pub fn state(model: GravityModel) -> Vec<String> {
    let mut notes = vec![
        FIRST_ORDER,
        "instantaneous rate at this state; the tidal potentials of the Moon and the Sun are neglected (about 1e-16 and 8e-16 at GEO)",
        "periodic.value_at_state_s = -2 (r . v)/c^2 (IS-GPS-200 20.3.3.3.3.1); periodic.amplitude_s is that of the osculating point-mass Keplerian orbit (IERS Conventions (2010) GM), absent when the state is not on a closed orbit above the Earth",
    ];
    if model == GravityModel::J2 {
        notes.push("J2 about the frame's z axis: exact for ITRF; for GCRS the precession-nutation tilt of the pole changes the rate by less than 3e-15 for low orbits");
    }
    notes.into_iter().map(String::from).collect()
}

/// Notes for a Keplerian orbit.
pub fn orbit() -> Vec<String> {
    [
        FIRST_ORDER,
        "mean rate over one revolution of a point-mass Keplerian orbit: sr = -GM/(2ac^2), gr = (W0 - GM/a)/c^2 against TT (Ashby (2003) Living Rev. Relativity 6, 1)",
        "GM = 3.986004418e14 m^3/s^2 (IERS Conventions (2010), TCG-compatible); the IS-GPS-200 value 3.986005e14 changes the total by less than 1e-16 and the periodic amplitude by about 7e-8 of itself",
        "inclination, node and argument of perigee do not change the first-order rate or the periodic term",
    ]
    .into_iter()
    .map(String::from)
    .collect()
}

/// Notes for a ground site; `label` is the model actually used.
pub fn ground(label: &str) -> Vec<String> {
    let specific = match label {
        "grs80_normal_gravity" => "height above the geoid: W0 - W from GRS80 normal gravity (Heiskanen & Moritz (1967) eq. 2-215), so a clock on the geoid has rate 0 against TT; gravity_model is not used",
        "j2" => "height above the GRS80 ellipsoid with a J2 Earth: within 1.8e-15 of W0 on the ellipsoid; the geoid undulation (up to about +-100 m, +-1.1e-14) is not in the model: give height_reference geoid for 1e-16 work",
        _ => "height above the GRS80 ellipsoid with a point-mass Earth: ignores the Earth's flattening, off by up to about 7e-13 on the ground; j2 (the default for ground sites) is far closer",
    };
    vec![
        FIRST_ORDER.to_string(),
        "clock at rest on the Earth rotating at omega_E = 7.292115e-5 rad/s; tides and polar motion are not modelled; length-of-day variations change the rotation term by below 1e-19".to_string(),
        specific.to_string(),
    ]
}

/// Notes for a lunar site; `j2_requested` when the item or request asked for J2.
pub fn lunar(j2_requested: bool) -> Vec<String> {
    let mut notes = vec![
        FIRST_ORDER,
        "mean rate in the geocentric frame: the Moon on a circular orbit of 384 400 km at the two-body speed, rotating synchronously; the monthly periodic term of the lunar eccentricity (about 0.47 us amplitude) is not included",
        "the Moon's own potential as a point mass (GM of JPL DE430) through its geocentric tidal part; the Sun's tidal potential (about 0.001 to 0.004 us/day), the lunar J2 (about 6e-15), librations and the tilts of the lunar axis and orbit are neglected",
    ];
    if j2_requested {
        notes.push("the Earth's J2 changes the potential at the Moon by less than 1 m^2/s^2 (below 1e-17 of rate): a point-mass Earth is used");
    }
    notes.into_iter().map(String::from).collect()
}
