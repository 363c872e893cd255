//! Tests of the TDB - TT series against pyerfa, of the fitted form against the series, and of
//! published magnitudes.

use super::fitted::{locate, FIRST_INTERVAL_START_DAYS, INTERVAL_COUNT, INTERVAL_DAYS};
use super::series::{parse_table, table};
use super::*;

/// Reference values made by `tests/reference/make_tdb_reference.py` with pyerfa's `erfa.dtdb`.
const ERFA_CSV: &str = include_str!("../../../../tests/reference/tdb_minus_tt_erfa.csv");

/// TT seconds since J2000.0 of 1960-01-01T00:00 TT (JD 2436934.5) and 2100-01-01T00:00 TT
/// (JD 2488069.5), proleptic Gregorian calendar (common practice).
const START_1960_S: f64 = (2_436_934.5 - 2_451_545.0) * 86_400.0;
const END_2100_S: f64 = (2_488_069.5 - 2_451_545.0) * 86_400.0;

/// SplitMix64 (Steele, Lea & Flood 2014): a small deterministic generator for test epochs.
struct SplitMix64(u64);

impl SplitMix64 {
    fn next_u64(&mut self) -> u64 {
        self.0 = self.0.wrapping_add(0x9E37_79B9_7F4A_7C15);
        let mut z = self.0;
        z = (z ^ (z >> 30)).wrapping_mul(0xBF58_476D_1CE4_E5B9);
        z = (z ^ (z >> 27)).wrapping_mul(0x94D0_49BB_1331_11EB);
        z ^ (z >> 31)
    }
    /// Uniform in [0, 1).
    fn unit(&mut self) -> f64 {
        (self.next_u64() >> 11) as f64 / (1u64 << 53) as f64
    }
    fn uniform(&mut self, low: f64, high: f64) -> f64 {
        low + (high - low) * self.unit()
    }
}

struct ErfaRow {
    tt_since_j2000_s: f64,
    ut1_day_fraction: f64,
    observer: Option<TopocentricObserver>,
    tdb_minus_tt_s: f64,
}

fn erfa_rows() -> Vec<ErfaRow> {
    ERFA_CSV
        .lines()
        .filter(|line| !line.starts_with('#') && !line.starts_with("tt_since"))
        .map(|line| {
            let f: Vec<&str> = line.split(',').collect();
            assert_eq!(f.len(), 6, "bad CSV line {line}");
            let number = |s: &str| s.parse::<f64>().unwrap();
            let observer = if f[2].is_empty() {
                None
            } else {
                Some(TopocentricObserver::from_itrf_m([
                    number(f[2]),
                    number(f[3]),
                    number(f[4]),
                ]))
            };
            ErfaRow {
                tt_since_j2000_s: number(f[0]),
                ut1_day_fraction: number(f[1]),
                observer,
                tdb_minus_tt_s: number(f[5]),
            }
        })
        .collect()
}

#[test]
fn table_has_the_published_block_sizes() {
    // Source: Fairhead & Bretagnon (1990) full series, 787 terms, as tabulated in ERFA dtdb.c:
    // sets 1-474 T^0, 475-679 T^1, 680-764 T^2, 765-784 T^3, 785-787 T^4; 4 periodic + 1 T^2
    // planetary-mass adjustment terms.
    let table = table().as_ref().expect("embedded table parses");
    let sizes: Vec<usize> = table.blocks.iter().map(Vec::len).collect();
    assert_eq!(sizes, vec![474, 205, 85, 20, 3]);
    assert_eq!(table.adjustment.len(), 4);
    assert_eq!(table.polynomial, vec![(2, 0.03638e-6)]);
    // Source: ERFA dtdb.c, first row: the annual term, 1656.674564 us, 6283.075849991 rad/millennium.
    let annual = table.blocks[0][0];
    assert_eq!(annual.amplitude_s, 1656.674564e-6);
    assert_eq!(annual.frequency_rad_per_millennium, 6283.075849991);
    assert_eq!(annual.phase_rad, 6.240054195);
}

#[test]
fn parser_rejects_malformed_lines() {
    // Source: the file format written by tools/extract_fairhead_bretagnon.py (common practice:
    // a corrupted data file must be reported, not read as zeros).
    for bad in [
        "FB 5 1e-6 1.0 1.0",
        "FB 0 1e-6 1.0",
        "FB 0 nan 1.0 1.0",
        "ADJ 1 1e-6 1.0 1.0",
        "POLY 2 1e-6 1.0 0",
        "XX 0 1e-6 1.0 1.0",
    ] {
        let text = format!("# comment\nFB 0 1e-6 2.0 3.0\n{bad}\n");
        let error = parse_table(&text).expect_err(bad);
        assert_eq!(error.line_number, 3, "{bad}");
    }
}

#[test]
fn full_series_matches_erfa_within_one_picosecond() {
    // Source: pyerfa erfa.dtdb (ERFA eraDtdb), tests/reference/tdb_minus_tt_erfa.csv.
    let rows = erfa_rows();
    assert_eq!(rows.len(), 3000);
    assert!(rows.iter().any(|row| row.observer.is_none()));
    assert!(rows.iter().any(|row| row.observer.is_some()));
    let mut worst_s: f64 = 0.0;
    for row in &rows {
        let ours_s = tdb_minus_tt_series_s(
            row.tt_since_j2000_s,
            row.ut1_day_fraction,
            row.observer.as_ref(),
        );
        let difference_s = (ours_s - row.tdb_minus_tt_s).abs();
        assert!(
            difference_s <= 1e-12,
            "t = {} s: ours {ours_s:e}, ERFA {:e}",
            row.tt_since_j2000_s,
            row.tdb_minus_tt_s
        );
        worst_s = worst_s.max(difference_s);
    }
    eprintln!("full series vs ERFA: worst |difference| = {worst_s:e} s");
}

#[test]
fn fast_matches_full_series_on_random_epochs() {
    // Source: the full series of this module (the fitted form must stay within 1e-13 s of it).
    let mut generator = SplitMix64(0x7DB5_EE1E_5000_0001);
    let station = TopocentricObserver::from_itrf_m([4_075_539.0, 931_735.0, 4_801_629.0]);
    let mut worst_s: f64 = 0.0;
    for index in 0..20_000 {
        let tt_s = generator.uniform(START_1960_S, END_2100_S);
        let ut1 = generator.unit();
        let observer = (index % 4 == 0).then_some(&station);
        let full_s = tdb_minus_tt_series_s(tt_s, ut1, observer);
        let fast_s = tdb_minus_tt_fast_s(tt_s, ut1, observer);
        let difference_s = (fast_s - full_s).abs();
        assert!(difference_s <= 1e-13, "t = {tt_s} s: {difference_s:e} s");
        worst_s = worst_s.max(difference_s);
    }
    eprintln!("fast vs full, 20 000 random epochs: worst |difference| = {worst_s:e} s");
}

#[test]
fn fast_matches_full_series_at_interval_boundaries() {
    // Source: the full series of this module; each boundary is approached from both sides
    // (1 ms away) and hit exactly, 1960-2100.
    let first = locate(START_1960_S / 86_400.0).expect("1960 is fitted").0;
    let last = locate(END_2100_S / 86_400.0).expect("2100 is fitted").0;
    let mut worst_s: f64 = 0.0;
    for index in first..=last + 1 {
        let boundary_s = (FIRST_INTERVAL_START_DAYS + index as f64 * INTERVAL_DAYS) * 86_400.0;
        for tt_s in [boundary_s - 1e-3, boundary_s, boundary_s + 1e-3] {
            let difference_s = (tdb_minus_tt_fast_s(tt_s, 0.0, None)
                - tdb_minus_tt_series_s(tt_s, 0.0, None))
            .abs();
            assert!(difference_s <= 1e-13, "t = {tt_s} s: {difference_s:e} s");
            worst_s = worst_s.max(difference_s);
        }
    }
    eprintln!("fast vs full at interval boundaries: worst |difference| = {worst_s:e} s");
}

#[test]
fn fast_falls_back_to_the_series_outside_the_fitted_span() {
    // Source: this module's design (module doc): outside 1899-12-31 .. 2200-01-07 the fast form
    // is the full series itself.
    let end_s = (FIRST_INTERVAL_START_DAYS + INTERVAL_COUNT as f64 * INTERVAL_DAYS) * 86_400.0;
    let start_s = FIRST_INTERVAL_START_DAYS * 86_400.0;
    for tt_s in [start_s - 1.0, end_s, end_s + 1.0e9, -1.0e10] {
        assert_eq!(
            tdb_minus_tt_fast_s(tt_s, 0.25, None),
            tdb_minus_tt_series_s(tt_s, 0.25, None)
        );
    }
}

#[test]
fn annual_term_dominates_with_about_1_657_ms() {
    // Source: Fairhead & Bretagnon (1990), main annual term 1.657 ms (from memory); with the
    // other terms (22 us and below) the extreme over a year stays within 1.6 .. 1.7 ms.
    let year_2020_s = (2_458_849.5 - 2_451_545.0) * 86_400.0;
    let mut largest_s: f64 = 0.0;
    for step in 0..(366 * 4) {
        let tt_s = year_2020_s + step as f64 * 21_600.0;
        largest_s = largest_s.max(tdb_minus_tt_series_s(tt_s, 0.0, None).abs());
    }
    assert!((1.6e-3..1.7e-3).contains(&largest_s), "{largest_s:e} s");
}

#[test]
fn topocentric_part_is_about_two_microseconds_on_the_equator() {
    // Source: ERFA eraDtdb note 4 ("diurnal terms up to 2 microseconds"); leading term
    // 3.17679e-10 s/km x 6378 km = 2.03 us (Moyer 1981, Murray 1983).
    let equator = TopocentricObserver::from_itrf_m([6_378_137.0, 0.0, 0.0]);
    let tt_s = 7.0e8;
    let geocentric_s = tdb_minus_tt_series_s(tt_s, 0.0, None);
    let largest_s = (0..96)
        .map(|quarter_hour| quarter_hour as f64 / 96.0)
        .map(|ut1| (tdb_minus_tt_series_s(tt_s, ut1, Some(&equator)) - geocentric_s).abs())
        .fold(0.0, f64::max);
    assert!((1.9e-6..2.2e-6).contains(&largest_s), "{largest_s:e} s");
}

#[test]
fn observer_from_itrf_position() {
    // Source: ERFA eraDtdb arguments (elong east-positive radians, u and v in km), formed as
    // atan2(y, x), hypot(x, y) / 1000, z / 1000 (common practice).
    let observer = TopocentricObserver::from_itrf_m([0.0, 3_000_000.0, 4_000_000.0]);
    assert_eq!(observer.east_longitude_rad, std::f64::consts::FRAC_PI_2);
    assert_eq!(observer.spin_axis_distance_km, 3_000.0);
    assert_eq!(observer.equatorial_plane_distance_km, 4_000.0);
    let west = TopocentricObserver::from_itrf_m([3_000.0, -4_000.0, -1_000.0]);
    assert!((west.east_longitude_rad - (-4.0f64).atan2(3.0)).abs() < 1e-15);
    assert_eq!(west.spin_axis_distance_km, 5.0);
    assert_eq!(west.equatorial_plane_distance_km, -1.0);
}

#[test]
fn non_finite_input_gives_nan_without_panic() {
    // Source: project rule (no panic on any input; common practice: NaN propagates).
    let observer = TopocentricObserver::from_itrf_m([f64::NAN, 0.0, 0.0]);
    for tt_s in [f64::NAN, f64::INFINITY, f64::NEG_INFINITY] {
        assert!(tdb_minus_tt_series_s(tt_s, 0.5, None).is_nan());
        assert!(tdb_minus_tt_fast_s(tt_s, 0.5, None).is_nan());
    }
    assert!(tdb_minus_tt_fast_s(0.0, f64::NAN, Some(&observer)).is_nan());
    assert!(tdb_minus_tt_series_s(0.0, 0.5, Some(&observer)).is_nan());
}

#[test]
fn fitted_intervals_are_shared_safely_between_threads() {
    // Source: common practice (lazy per-interval initialisation must give every thread the
    // same coefficients, whichever thread builds them).
    let epochs: Vec<f64> = (0..64).map(|i| 1.9e9 + i as f64 * 3.0e5).collect();
    let results: Vec<Vec<f64>> = std::thread::scope(|scope| {
        let handles: Vec<_> = (0..4)
            .map(|_| {
                scope.spawn(|| {
                    epochs
                        .iter()
                        .map(|&t| tdb_minus_tt_fast_s(t, 0.0, None))
                        .collect::<Vec<f64>>()
                })
            })
            .collect();
        handles.into_iter().map(|h| h.join().unwrap()).collect()
    });
    for other in &results[1..] {
        assert_eq!(other, &results[0]);
    }
    for (tt_s, fast_s) in epochs.iter().zip(&results[0]) {
        assert!((fast_s - tdb_minus_tt_series_s(*tt_s, 0.0, None)).abs() <= 1e-13);
    }
}
