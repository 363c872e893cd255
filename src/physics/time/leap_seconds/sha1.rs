//! SHA-1 (FIPS 180-4), only to check the integrity hash of an IETF/tz `leap-seconds.list`
//! (not for security).

/// SHA-1 digest of `data` as five 32-bit words (FIPS PUB 180-4, section 6.1).
pub(crate) fn sha1_words(data: &[u8]) -> [u32; 5] {
    let mut h: [u32; 5] = [
        0x6745_2301,
        0xEFCD_AB89,
        0x98BA_DCFE,
        0x1032_5476,
        0xC3D2_E1F0,
    ];
    let bit_len = (data.len() as u64).wrapping_mul(8);
    let mut message = data.to_vec();
    message.push(0x80);
    while message.len() % 64 != 56 {
        message.push(0);
    }
    message.extend_from_slice(&bit_len.to_be_bytes());
    for block in message.chunks_exact(64) {
        let mut w = [0u32; 80];
        for (word, bytes) in w.iter_mut().zip(block.chunks_exact(4)) {
            *word = bytes.iter().fold(0, |acc, &b| (acc << 8) | u32::from(b));
        }
        for t in 16..80 {
            w[t] = (w[t - 3] ^ w[t - 8] ^ w[t - 14] ^ w[t - 16]).rotate_left(1);
        }
        let [mut a, mut b, mut c, mut d, mut e] = h;
        for (t, &wt) in w.iter().enumerate() {
            let (f, k) = match t {
                0..=19 => ((b & c) | (!b & d), 0x5A82_7999),
                20..=39 => (b ^ c ^ d, 0x6ED9_EBA1),
                40..=59 => ((b & c) | (b & d) | (c & d), 0x8F1B_BCDC),
                _ => (b ^ c ^ d, 0xCA62_C1D6),
            };
            let temp = a
                .rotate_left(5)
                .wrapping_add(f)
                .wrapping_add(e)
                .wrapping_add(k)
                .wrapping_add(wt);
            e = d;
            d = c;
            c = b.rotate_left(30);
            b = a;
            a = temp;
        }
        for (hi, v) in h.iter_mut().zip([a, b, c, d, e]) {
            *hi = hi.wrapping_add(v);
        }
    }
    h
}

#[cfg(test)]
mod tests {
    use super::sha1_words;

    #[test]
    fn fips_180_examples() {
        // FIPS 180-4 / RFC 3174 test vectors: "abc" and the 448-bit two-block message
        assert_eq!(
            sha1_words(b"abc"),
            [
                0xa999_3e36,
                0x4706_816a,
                0xba3e_2571,
                0x7850_c26c,
                0x9cd0_d89d
            ]
        );
        assert_eq!(
            sha1_words(b"abcdbcdecdefdefgefghfghighijhijkijkljklmklmnlmnomnopnopq"),
            [
                0x8498_3e44,
                0x1c3b_d26e,
                0xbaae_4aa1,
                0xf951_29e5,
                0xe546_70f1
            ]
        );
        // RFC 3174: empty message (common practice test vector)
        assert_eq!(
            sha1_words(b""),
            [
                0xda39_a3ee,
                0x5e6b_4b0d,
                0x3255_bfef,
                0x9560_1890,
                0xafd8_0709
            ]
        );
    }
}
