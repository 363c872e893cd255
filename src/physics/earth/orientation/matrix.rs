//! 3 x 3 rotation matrices in ERFA's convention: row-major `[[f64; 3]; 3]`, a matrix `r` maps a
//! column vector `v` to `r v`, and `rotate_*` pre-multiply an existing matrix by an elementary
//! rotation of the reference frame (ERFA `eraRx`, `eraRy`, `eraRz`).

/// A rotation matrix, row-major: `m[row][column]`.
pub type Matrix3 = [[f64; 3]; 3];

/// The identity matrix (ERFA `eraIr`).
pub const IDENTITY: Matrix3 = [[1.0, 0.0, 0.0], [0.0, 1.0, 0.0], [0.0, 0.0, 1.0]];

/// `R1(phi) r`: rotate the frame about x by `phi_rad` (IERS Conventions (2010) ch. 5, the
/// elementary rotation R1 of eq. 5.3; ERFA `eraRx`).
pub fn rotate_x(phi_rad: f64, r: &mut Matrix3) {
    let (s, c) = phi_rad.sin_cos();
    let [_, row1, row2] = r;
    for (a1, a2) in row1.iter_mut().zip(row2.iter_mut()) {
        (*a1, *a2) = (c * *a1 + s * *a2, -s * *a1 + c * *a2);
    }
}

/// `R2(theta) r`: rotate the frame about y by `theta_rad` (IERS Conventions (2010) ch. 5, R2 of
/// eq. 5.3; ERFA `eraRy`).
pub fn rotate_y(theta_rad: f64, r: &mut Matrix3) {
    let (s, c) = theta_rad.sin_cos();
    let [row0, _, row2] = r;
    for (a0, a2) in row0.iter_mut().zip(row2.iter_mut()) {
        (*a0, *a2) = (c * *a0 - s * *a2, s * *a0 + c * *a2);
    }
}

/// `R3(psi) r`: rotate the frame about z by `psi_rad` (IERS Conventions (2010) ch. 5, R3 of
/// eq. 5.3; ERFA `eraRz`).
pub fn rotate_z(psi_rad: f64, r: &mut Matrix3) {
    let (s, c) = psi_rad.sin_cos();
    let [row0, row1, _] = r;
    for (a0, a1) in row0.iter_mut().zip(row1.iter_mut()) {
        (*a0, *a1) = (c * *a0 + s * *a1, -s * *a0 + c * *a1);
    }
}

/// The product `a b` (ERFA `eraRxr`).
pub fn multiply(a: &Matrix3, b: &Matrix3) -> Matrix3 {
    let mut product = [[0.0; 3]; 3];
    for (i, row) in product.iter_mut().enumerate() {
        for (j, cell) in row.iter_mut().enumerate() {
            *cell = (0..3).map(|k| a[i][k] * b[k][j]).sum();
        }
    }
    product
}

/// The transpose, which is the inverse of a rotation (ERFA `eraTr`).
pub fn transpose(r: &Matrix3) -> Matrix3 {
    let mut t = [[0.0; 3]; 3];
    for (i, row) in r.iter().enumerate() {
        for (j, value) in row.iter().enumerate() {
            t[j][i] = *value;
        }
    }
    t
}

/// `r v` (ERFA `eraRxp`). Written out element by element: `[0, 1, 2].map(..)` was not inlined
/// in the release build (a call per product, measured with callgrind on the Earth-fixed
/// proper-time bench); the sums are the same, in the same order.
pub fn apply(r: &Matrix3, v: &[f64; 3]) -> [f64; 3] {
    [
        r[0][0] * v[0] + r[0][1] * v[1] + r[0][2] * v[2],
        r[1][0] * v[0] + r[1][1] * v[1] + r[1][2] * v[2],
        r[2][0] * v[0] + r[2][1] * v[1] + r[2][2] * v[2],
    ]
}

/// `r^T v`, the inverse rotation applied to `v` (ERFA `eraTrxp`); written out as [`apply`].
pub fn apply_transpose(r: &Matrix3, v: &[f64; 3]) -> [f64; 3] {
    [
        r[0][0] * v[0] + r[1][0] * v[1] + r[2][0] * v[2],
        r[0][1] * v[0] + r[1][1] * v[1] + r[2][1] * v[2],
        r[0][2] * v[0] + r[1][2] * v[1] + r[2][2] * v[2],
    ]
}

#[cfg(test)]
mod tests {
    use super::*;

    /// A quarter turn of the frame about z maps the x axis to -y (IERS Conventions (2010)
    /// ch. 5: R3(theta) rotates the axes counter-clockwise, so fixed vectors turn clockwise).
    #[test]
    fn quarter_turn_about_z_maps_x_to_minus_y() {
        let mut r = IDENTITY;
        rotate_z(std::f64::consts::FRAC_PI_2, &mut r);
        let v = apply(&r, &[1.0, 0.0, 0.0]);
        assert!((v[0]).abs() < 1e-16 && (v[1] + 1.0).abs() < 1e-16 && v[2] == 0.0);
        let back = apply_transpose(&r, &v);
        assert!((back[0] - 1.0).abs() < 1e-16 && back[1].abs() < 1e-16);
    }

    /// R1 and R2 quarter turns (same convention): y -> -z under R1, z -> -x under R2.
    #[test]
    fn quarter_turns_about_x_and_y() {
        let mut r = IDENTITY;
        rotate_x(std::f64::consts::FRAC_PI_2, &mut r);
        let v = apply(&r, &[0.0, 1.0, 0.0]);
        assert!(v[0] == 0.0 && v[1].abs() < 1e-16 && (v[2] + 1.0).abs() < 1e-16);
        let mut r = IDENTITY;
        rotate_y(std::f64::consts::FRAC_PI_2, &mut r);
        let v = apply(&r, &[0.0, 0.0, 1.0]);
        assert!((v[0] + 1.0).abs() < 1e-16 && v[1] == 0.0 && v[2].abs() < 1e-16);
    }

    /// A rotation times its transpose is the identity (orthogonality; from memory).
    #[test]
    fn rotation_times_transpose_is_identity() {
        let mut r = IDENTITY;
        rotate_z(0.3, &mut r);
        rotate_x(-1.1, &mut r);
        rotate_y(2.0, &mut r);
        let p = multiply(&r, &transpose(&r));
        for (i, row) in p.iter().enumerate() {
            for (j, value) in row.iter().enumerate() {
                let expected = if i == j { 1.0 } else { 0.0 };
                assert!((value - expected).abs() < 1e-15, "{i}{j}: {value}");
            }
        }
    }
}
