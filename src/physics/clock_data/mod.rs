//! Relativistic corrections of satellite clock data, and the J2 terms of an orbiting clock.
//!
//! A clock with inertial (GCRS) velocity v at geocentric position r in the Earth's field
//! U = GM/r + U_J2 (positive potential; U_J2 = -GM J2 a_E^2 P2(sin phi) / r^3) runs at
//! d(tau)/dt = 1 - (v^2/2 + U)/c^2 (IERS Conventions (2010) eq. 10.6).
//!
//! **Derivation of the periodic terms (ours, from the J2 potential).** The field is static and
//! symmetric about the z axis, so the energy E = v^2/2 - GM/r - U_J2 is constant. U_J2 is
//! homogeneous of degree -3 in r, so r . grad(U_J2) = -3 U_J2 (Euler's theorem) and
//! d(r.v)/dt = v^2 + r.a = v^2 - GM/r - 3 U_J2. Eliminating GM/r with the energy:
//!
//! ```text
//! v^2/2 + U = 2 d(r.v)/dt - 3 E + 4 U_J2
//! tau - t   = (3E/c^2) t - 2 r.v/c^2 - (4/c^2) integral(U_J2 dt)
//! ```
//!
//! The first periodic term is the conventional -2 r.v/c^2 (IS-GPS-200 20.3.3.3.3.1), exact
//! for any field of this form. On a near-circular orbit (r = a, u = n t, sin phi = sin i sin u)
//! the periodic part of U_J2 is (3/4) GM J2 a_E^2 sin^2(i) cos(2u) / a^3; its integral over
//! t = u/n, times -4/c^2, with GM/(n a^3) = n, is
//!
//! ```text
//! dt_J2 = -(3/2) J2 (a_E^2/c^2) sqrt(GM/a^3) sin^2(i) sin(2u)
//! ```
//!
//! which is the formula of Kouba (2004), GPS Solutions 8:170-180, sign and factor included.
//! Its neglected parts are of order e and J2 relative to itself (about 1 ps for e = 0.01; the
//! tests measure them on a numerically integrated J2 orbit). The constant part of U_J2 gives
//! the mean rate change of [`terms::j2_mean_rate_parts`].
//!
//! **Which clocks contain which terms.** A clock read against system time (raw) contains both
//! periodic terms. The IGS clock products (SP3, RINEX clock) are estimated with the
//! conventional term modelled, so their values leave it out and the user adds it back to get
//! the satellite's actual clock (common practice; IGS product conventions); the J2 term stays in
//! them. [`series`] corrects either kind.

pub mod fit;
pub mod orbit_j2;
pub mod series;
pub mod terms;

#[cfg(test)]
mod integrated_tests;
#[cfg(test)]
mod tests;
