//! PLACEHOLDER for compilation only; replaced by the real series on merge.
#[derive(Debug, Clone, Copy)]
pub struct TopocentricObserver {
    pub east_longitude_rad: f64,
    pub spin_axis_distance_km: f64,
    pub equatorial_plane_distance_km: f64,
}
impl TopocentricObserver {
    pub fn from_itrf_m(p: [f64; 3]) -> Self {
        Self {
            east_longitude_rad: p[1].atan2(p[0]),
            spin_axis_distance_km: p[0].hypot(p[1]) / 1000.0,
            equatorial_plane_distance_km: p[2] / 1000.0,
        }
    }
}
pub fn tdb_minus_tt_series_s(t: f64, _u: f64, _o: Option<&TopocentricObserver>) -> f64 {
    0.001657 * (6.24 + 0.017202 * t / 86400.0).sin()
}
pub fn tdb_minus_tt_fast_s(t: f64, u: f64, o: Option<&TopocentricObserver>) -> f64 {
    tdb_minus_tt_series_s(t, u, o)
}
