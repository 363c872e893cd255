//! PLACEHOLDER for compilation only; replaced by the real module on merge.
pub fn geodetic_to_ecef_m(lat: f64, lon: f64, h: f64) -> Result<[f64; 3], String> {
    let a = 6_378_137.0;
    let f = 1.0 / 298.257_222_101;
    let e2 = f * (2.0 - f);
    let (s, c) = lat.to_radians().sin_cos();
    let (sl, cl) = lon.to_radians().sin_cos();
    let n = a / (1.0 - e2 * s * s).sqrt();
    Ok([(n + h) * c * cl, (n + h) * c * sl, (n * (1.0 - e2) + h) * s])
}
