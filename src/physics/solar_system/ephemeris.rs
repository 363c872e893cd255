//! An ephemeris built from SPK segments: states of any body about any other, in metres.

use std::sync::{Arc, OnceLock};

use super::body::Body;
use super::daf::{read_directory, KernelError};
use super::error::EphemerisError;
use super::gm::EARTH_MOON_MASS_RATIO;
use super::segment::{ChebyshevSegment, StateKm};
use crate::physics::time::calendar::CalendarDate;
use crate::physics::time::instant::{seconds_f64_to_attos, ATTOS_PER_SECOND};

/// The embedded excerpt of DE440 (see `data/README.md`).
static EMBEDDED_BYTES: &[u8] = include_bytes!("data/de440_1959_2101.bsp");
/// The name under which the embedded excerpt is reported.
pub const EMBEDDED_NAME: &str = "DE440 (built-in excerpt 1959-01-01 .. 2102-01-01 TDB)";
const M_PER_KM: f64 = 1e3;

/// The segments every ephemeris needs, as (target, centre) NAIF ids: the planetary
/// barycentres, the Sun and the Earth-Moon barycentre about the solar-system barycentre, and
/// the Moon about the Earth-Moon barycentre. (The Earth about the Earth-Moon barycentre is
/// used when present and derived from the Moon's otherwise.)
pub const NEEDED_SEGMENTS: [(i32, i32); 11] = [
    (1, 0),
    (2, 0),
    (3, 0),
    (4, 0),
    (5, 0),
    (6, 0),
    (7, 0),
    (8, 0),
    (9, 0),
    (10, 0),
    (301, 3),
];
const EARTH_SEGMENT: (i32, i32) = (399, 3);

/// A position (m) and velocity (m/s) in ICRF axes.
#[derive(Debug, Clone, Copy, PartialEq)]
pub struct BodyState {
    /// Position, metres.
    pub position_m: [f64; 3],
    /// Velocity, m/s.
    pub velocity_m_s: [f64; 3],
}

/// The epochs an ephemeris covers, TDB seconds since J2000 (both inclusive).
#[derive(Debug, Clone, Copy, PartialEq)]
pub struct EphemerisSpan {
    /// First epoch covered.
    pub first_tdb_s: f64,
    /// Last epoch covered.
    pub last_tdb_s: f64,
}

/// A TDB epoch (seconds since J2000) as `YYYY-MM-DDThh:mm:ss` (rounded to the second).
pub fn tdb_text(tdb_s: f64) -> String {
    if !tdb_s.is_finite() || tdb_s.abs() > 1e15 {
        return format!("{tdb_s} s after J2000");
    }
    // J2000 is MJD 51544.5.
    let seconds = (tdb_s + 43_200.0).round() as i64;
    let (days, second_of_day) = (seconds.div_euclid(86_400), seconds.rem_euclid(86_400));
    let date = CalendarDate::from_mjd(51_544 + days);
    format!(
        "{:04}-{:02}-{:02}T{:02}:{:02}:{:02}",
        date.year,
        date.month,
        date.day,
        second_of_day / 3600,
        second_of_day / 60 % 60,
        second_of_day % 60
    )
}

enum KernelBytes {
    Static(&'static [u8]),
    Owned(Vec<u8>),
}

impl KernelBytes {
    fn as_slice(&self) -> &[u8] {
        match self {
            Self::Static(bytes) => bytes,
            Self::Owned(bytes) => bytes,
        }
    }
}

/// Segment states already evaluated at one instant: one entry per [`NEEDED_SEGMENTS`] slot and
/// one for the Earth's own segments.
#[derive(Default)]
struct SegmentMemo([Option<StateKm>; NEEDED_SEGMENTS.len() + 1]);

/// A planetary ephemeris: SPK type 2/3 segments with the bytes that hold them.
pub struct Ephemeris {
    name: String,
    bytes: KernelBytes,
    /// For each of [`NEEDED_SEGMENTS`], its segments (later ones take precedence, as in SPK).
    segments: Vec<Vec<ChebyshevSegment>>,
    earth: Vec<ChebyshevSegment>,
    span: EphemerisSpan,
}

impl std::fmt::Debug for Ephemeris {
    fn fmt(&self, f: &mut std::fmt::Formatter<'_>) -> std::fmt::Result {
        f.debug_struct("Ephemeris")
            .field("name", &self.name)
            .field("span", &self.span)
            .finish()
    }
}

impl Ephemeris {
    /// The built-in excerpt of DE440 (parsed once, shared; its records stay in the binary's
    /// read-only data and are read in place). An error only if the build embedded a damaged
    /// product (the unit tests read it).
    pub fn embedded() -> Result<Arc<Ephemeris>, KernelError> {
        static EMBEDDED: OnceLock<Result<Arc<Ephemeris>, KernelError>> = OnceLock::new();
        EMBEDDED
            .get_or_init(|| {
                Self::build(
                    EMBEDDED_NAME.to_string(),
                    KernelBytes::Static(EMBEDDED_BYTES),
                )
                .map(Arc::new)
            })
            .clone()
    }

    /// Parses the bytes of an SPK kernel (DAF, type 2 and 3 segments) named `name`; refuses a
    /// malformed kernel or one lacking a needed segment, naming it.
    pub fn from_kernel(name: impl Into<String>, bytes: Vec<u8>) -> Result<Self, KernelError> {
        Self::build(name.into(), KernelBytes::Owned(bytes))
    }

    fn build(name: String, bytes: KernelBytes) -> Result<Self, KernelError> {
        let data = bytes.as_slice();
        let directory = read_directory(data)?;
        let mut segments = vec![Vec::new(); NEEDED_SEGMENTS.len()];
        let mut earth = Vec::new();
        for summary in &directory.summaries {
            let pair = (summary.target, summary.center);
            let slot = NEEDED_SEGMENTS.iter().position(|&p| p == pair);
            if slot.is_none() && pair != EARTH_SEGMENT {
                continue;
            }
            if summary.frame != 1 {
                return Err(KernelError(format!(
                    "segment `{}` (body {} about {}) is in frame {}, not J2000/ICRF (1)",
                    summary.name, summary.target, summary.center, summary.frame
                )));
            }
            let segment = ChebyshevSegment::new(data, directory.order, summary)?;
            match slot {
                Some(i) => segments[i].push(segment),
                None => earth.push(segment),
            }
        }
        let mut first_tdb_s = f64::NEG_INFINITY;
        let mut last_tdb_s = f64::INFINITY;
        for (list, (target, center)) in segments
            .iter()
            .chain([&earth])
            .zip(NEEDED_SEGMENTS.iter().copied().chain([EARTH_SEGMENT]))
        {
            if list.is_empty() {
                if (target, center) == EARTH_SEGMENT {
                    continue;
                }
                return Err(KernelError(format!(
                    "the kernel has no segment of body {target} about {center} (NAIF ids), which the service needs"
                )));
            }
            let start = list.iter().map(|s| s.start_s).fold(f64::INFINITY, f64::min);
            let end = list
                .iter()
                .map(|s| s.end_s)
                .fold(f64::NEG_INFINITY, f64::max);
            first_tdb_s = first_tdb_s.max(start);
            last_tdb_s = last_tdb_s.min(end);
        }
        if first_tdb_s > last_tdb_s {
            return Err(KernelError(
                "the needed segments have no epoch in common".to_string(),
            ));
        }
        Ok(Self {
            name,
            bytes,
            segments,
            earth,
            span: EphemerisSpan {
                first_tdb_s,
                last_tdb_s,
            },
        })
    }

    /// The ephemeris's name (the built-in excerpt's, or the kernel file's).
    pub fn name(&self) -> &str {
        &self.name
    }

    /// The epochs every body is covered at.
    pub fn span(&self) -> EphemerisSpan {
        self.span
    }

    /// Whether the Earth comes from its own segment (false: derived from the Moon's with the
    /// DE440 Earth-Moon mass ratio).
    pub fn has_earth_segment(&self) -> bool {
        !self.earth.is_empty()
    }

    fn outside(&self, tdb_s: f64) -> EphemerisError {
        EphemerisError::OutsideSpan {
            ephemeris: self.name.clone(),
            epoch: tdb_text(tdb_s),
            first: tdb_text(self.span.first_tdb_s),
            last: tdb_text(self.span.last_tdb_s),
        }
    }

    /// The state of one segment list (`slot` into [`NEEDED_SEGMENTS`], or one past its end for
    /// the Earth's own segments), km and km/s, evaluated once per instant through `memo`.
    fn segment_km(
        &self,
        memo: &mut SegmentMemo,
        slot: usize,
        attos: i128,
        tdb_s: f64,
    ) -> Option<StateKm> {
        if let Some(state) = memo.0.get(slot).copied().flatten() {
            return Some(state);
        }
        let list = self.segments.get(slot).unwrap_or(&self.earth);
        let state = list
            .iter()
            .rev()
            .find(|s| s.covers(tdb_s))
            .and_then(|s| s.state_km(self.bytes.as_slice(), attos))?;
        if let Some(entry) = memo.0.get_mut(slot) {
            *entry = Some(state);
        }
        Some(state)
    }

    /// The state of `body`, km and km/s, about the Earth-Moon barycentre for the Earth, the Moon
    /// and the barycentre itself (`true`) or about the solar-system barycentre (`false`).
    fn local_km(
        &self,
        memo: &mut SegmentMemo,
        body: Body,
        attos: i128,
        tdb_s: f64,
    ) -> Option<(bool, StateKm)> {
        let slot = |id: i32| NEEDED_SEGMENTS.iter().position(|&(t, _)| t == id);
        match body {
            Body::Ssb => Some((false, ([0.0; 3], [0.0; 3]))),
            Body::Emb => Some((true, ([0.0; 3], [0.0; 3]))),
            Body::Moon => Some((true, self.segment_km(memo, slot(301)?, attos, tdb_s)?)),
            Body::Earth if !self.earth.is_empty() => Some((
                true,
                self.segment_km(memo, NEEDED_SEGMENTS.len(), attos, tdb_s)?,
            )),
            Body::Earth => {
                let (p, v) = self.segment_km(memo, slot(301)?, attos, tdb_s)?;
                let k = -1.0 / EARTH_MOON_MASS_RATIO;
                Some((true, (p.map(|x| x * k), v.map(|x| x * k))))
            }
            other => Some((
                false,
                self.segment_km(memo, slot(other.naif_id())?, attos, tdb_s)?,
            )),
        }
    }

    /// Position (m) and velocity (m/s) of `body` relative to `center`, ICRF axes, at the TDB
    /// instant `tdb_attos` (attoseconds since J2000.0 TDB); an error naming the span outside it.
    pub fn state_m(
        &self,
        body: Body,
        center: Body,
        tdb_attos: i128,
    ) -> Result<BodyState, EphemerisError> {
        let [state] = self.states_m([(body, center)], tdb_attos)?;
        Ok(state)
    }

    /// [`Self::state_m`] for several (body, centre) pairs at one instant; each segment is
    /// evaluated once (the Moon's serves both the Moon and the Earth, the Earth-Moon
    /// barycentre's every pair that needs it), so the results equal separate calls exactly.
    pub fn states_m<const N: usize>(
        &self,
        pairs: [(Body, Body); N],
        tdb_attos: i128,
    ) -> Result<[BodyState; N], EphemerisError> {
        let tdb_s = tdb_attos as f64 / ATTOS_PER_SECOND as f64;
        if !(tdb_s >= self.span.first_tdb_s && tdb_s <= self.span.last_tdb_s) {
            return Err(self.outside(tdb_s));
        }
        let mut memo = SegmentMemo::default();
        let mut states = [BodyState {
            position_m: [0.0; 3],
            velocity_m_s: [0.0; 3],
        }; N];
        for (state, (body, center)) in states.iter_mut().zip(pairs) {
            *state = self
                .pair_m(&mut memo, body, center, tdb_attos, tdb_s)
                .ok_or_else(|| self.outside(tdb_s))?;
        }
        Ok(states)
    }

    /// One (body, centre) pair for [`Self::states_m`]; `None` where a segment does not cover.
    fn pair_m(
        &self,
        memo: &mut SegmentMemo,
        body: Body,
        center: Body,
        tdb_attos: i128,
        tdb_s: f64,
    ) -> Option<BodyState> {
        let (body_emb, (bp, bv)) = self.local_km(memo, body, tdb_attos, tdb_s)?;
        let (center_emb, (cp, cv)) = self.local_km(memo, center, tdb_attos, tdb_s)?;
        // Both about the Earth-Moon barycentre: subtract there; otherwise move the ones about
        // it to the solar-system barycentre first.
        let emb = if body_emb != center_emb {
            let slot = NEEDED_SEGMENTS.iter().position(|&(t, _)| t == 3)?;
            self.segment_km(memo, slot, tdb_attos, tdb_s)?
        } else {
            ([0.0; 3], [0.0; 3])
        };
        let (bk, ck) = (
            f64::from(u8::from(body_emb && !center_emb)),
            f64::from(u8::from(center_emb && !body_emb)),
        );
        let mut state = BodyState {
            position_m: [0.0; 3],
            velocity_m_s: [0.0; 3],
        };
        for i in 0..3 {
            state.position_m[i] = (bp[i] - cp[i] + (bk - ck) * emb.0[i]) * M_PER_KM;
            state.velocity_m_s[i] = (bv[i] - cv[i] + (bk - ck) * emb.1[i]) * M_PER_KM;
        }
        Some(state)
    }

    /// [`Self::state_m`] at TDB seconds since J2000.0 given as a float.
    pub fn state_at_tdb_s(
        &self,
        body: Body,
        center: Body,
        tdb_s: f64,
    ) -> Result<BodyState, EphemerisError> {
        if !tdb_s.is_finite() {
            return Err(EphemerisError::NotFinite);
        }
        if tdb_s.abs() > 1e12 {
            return Err(self.outside(tdb_s));
        }
        self.state_m(body, center, seconds_f64_to_attos(tdb_s))
    }
}
