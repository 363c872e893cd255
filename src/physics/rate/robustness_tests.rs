//! Property test: no input (NaN, infinities, huge, tiny) makes a rate function panic, and every
//! accepted input gives finite results (common practice: the "no panics on any input" rule).

use proptest::prelude::*;

use super::*;

fn any_f64() -> impl Strategy<Value = f64> {
    prop_oneof![
        prop::num::f64::ANY,
        Just(f64::NAN),
        Just(f64::INFINITY),
        Just(f64::NEG_INFINITY),
        Just(0.0),
        -1.0e9..1.0e9f64,
        -100.0..100.0f64,
        0.0..1.0f64,
        6.0e6..5.0e7f64,
    ]
}

fn vector() -> impl Strategy<Value = [f64; 3]> {
    [any_f64(), any_f64(), any_f64()]
}

fn finite_parts(parts: &RateParts) -> bool {
    parts.sr.is_finite() && parts.gr.is_finite() && parts.total().is_finite()
}

proptest! {
    #![proptest_config(ProptestConfig::with_cases(2000))]

    #[test]
    fn state_rate_never_panics(position in vector(), velocity in vector(), itrf in any::<bool>()) {
        let frame = if itrf { Frame::Itrf } else { Frame::Gcrs };
        let state = StateVector { frame, position_m: position, velocity_m_s: velocity };
        for model in [GravityModel::PointMass, GravityModel::J2] {
            if let Ok(rate) = state_rate(&state, RateReference::Tt, model) {
                prop_assert!(finite_parts(&rate.parts) && rate.periodic_value_s.is_finite());
            }
        }
    }

    #[test]
    fn orbit_rate_never_panics(a in any_f64(), e in any_f64(), angle in any_f64(), kind in 0u8..4) {
        let anomaly = match kind {
            0 => None,
            1 => Some(Anomaly::TrueDeg(angle)),
            2 => Some(Anomaly::MeanDeg(angle)),
            _ => Some(Anomaly::EccentricDeg(angle)),
        };
        let orbit = KeplerianOrbit { semi_major_axis_m: a, eccentricity: e, anomaly };
        if let Ok(rate) = orbit_rate(&orbit, RateReference::Tcg, GravityModel::PointMass) {
            prop_assert!(finite_parts(&rate.mean) && rate.periodic.amplitude_s.is_finite());
            prop_assert!(rate.periodic.value_s.is_none_or(f64::is_finite));
        }
    }

    #[test]
    fn ground_and_lunar_rates_never_panic(lat in any_f64(), lon in any_f64(), h in any_f64(), geoid in any::<bool>()) {
        let height = if geoid { GroundHeight::AboveGeoidM(h) } else { GroundHeight::EllipsoidalM(h) };
        let ground = GroundSite { latitude_deg: lat, longitude_deg: lon, height };
        if let Ok(parts) = ground_site_rate(&ground, RateReference::Tt, GravityModel::J2) {
            prop_assert!(finite_parts(&parts));
        }
        let lunar = LunarSite { latitude_deg: lat, longitude_deg: lon, height_m: h };
        if let Ok(parts) = lunar_site_rate(&lunar, RateReference::Tt) {
            prop_assert!(finite_parts(&parts));
        }
    }

    #[test]
    fn frequency_never_panics(nominal in any_f64(), fractional in any_f64()) {
        if let Ok(frequency) = frequency_offset(nominal, fractional) {
            prop_assert!(frequency.offset_hz.is_finite() && frequency.factory_setting_hz.is_finite());
        }
    }
}
