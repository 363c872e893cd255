//! The bodies the ephemeris knows, with their NAIF ids.

use crate::physics::vocabulary::vocabulary;

vocabulary! {
    /// A body (or barycentre) of the solar system; each is also a possible centre.
    #[derive(Debug, Clone, Copy, PartialEq, Eq, Hash)]
    pub enum Body {
        /// The solar-system barycentre (the origin of the BCRS).
        Ssb = "ssb",
        /// The Sun.
        Sun = "sun",
        /// The barycentre of Mercury (Mercury itself in DE440, which gives it no satellite).
        MercuryBarycenter = "mercury_barycenter",
        /// The barycentre of Venus (Venus itself in DE440).
        VenusBarycenter = "venus_barycenter",
        /// The Earth-Moon barycentre.
        Emb = "emb",
        /// The Earth (its centre of mass, the GCRS origin).
        Earth = "earth",
        /// The Moon (its centre of mass).
        Moon = "moon",
        /// The barycentre of the Mars system.
        MarsBarycenter = "mars_barycenter",
        /// The barycentre of the Jupiter system.
        JupiterBarycenter = "jupiter_barycenter",
        /// The barycentre of the Saturn system.
        SaturnBarycenter = "saturn_barycenter",
        /// The barycentre of the Uranus system.
        UranusBarycenter = "uranus_barycenter",
        /// The barycentre of the Neptune system.
        NeptuneBarycenter = "neptune_barycenter",
        /// The barycentre of the Pluto system.
        PlutoBarycenter = "pluto_barycenter",
    }
}

impl Body {
    /// The NAIF integer id (NAIF "NAIF IDs Required Reading": 0 the solar-system barycentre,
    /// 1-9 the planetary barycentres, 10 the Sun, 301 the Moon, 399 the Earth).
    pub const fn naif_id(self) -> i32 {
        match self {
            Self::Ssb => 0,
            Self::MercuryBarycenter => 1,
            Self::VenusBarycenter => 2,
            Self::Emb => 3,
            Self::MarsBarycenter => 4,
            Self::JupiterBarycenter => 5,
            Self::SaturnBarycenter => 6,
            Self::UranusBarycenter => 7,
            Self::NeptuneBarycenter => 8,
            Self::PlutoBarycenter => 9,
            Self::Sun => 10,
            Self::Moon => 301,
            Self::Earth => 399,
        }
    }

    /// A readable name for messages ("the Moon", "the Jupiter barycentre").
    pub const fn label(self) -> &'static str {
        match self {
            Self::Ssb => "the solar-system barycentre",
            Self::Sun => "the Sun",
            Self::MercuryBarycenter => "the Mercury barycentre",
            Self::VenusBarycenter => "the Venus barycentre",
            Self::Emb => "the Earth-Moon barycentre",
            Self::Earth => "the Earth",
            Self::Moon => "the Moon",
            Self::MarsBarycenter => "the Mars barycentre",
            Self::JupiterBarycenter => "the Jupiter barycentre",
            Self::SaturnBarycenter => "the Saturn barycentre",
            Self::UranusBarycenter => "the Uranus barycentre",
            Self::NeptuneBarycenter => "the Neptune barycentre",
            Self::PlutoBarycenter => "the Pluto barycentre",
        }
    }
}
