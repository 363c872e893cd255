//! The one place each named value's spellings are written.
//!
//! [`vocabulary!`](crate::physics::vocabulary) declares an enum together with the exact text of
//! each value (and, where a standard knows several names for one value, the accepted aliases).
//! It generates:
//!
//! * `ALL`: every value, in declaration order (the order answers and documents list them);
//! * `NAMES`: the canonical spelling of every value, in the same order;
//! * `ACCEPTED`: every spelling read (canonical names and aliases), in the same order;
//! * `as_str`: the canonical spelling (what answers write);
//! * `from_name`: the value spelled exactly so (case-sensitive, no surrounding spaces), or
//!   `None`;
//! * `Display` (the canonical spelling), and the [`Vocabulary`] trait for generic code.
//!
//! Parsers, schema enums, test generators and fuzz selectors all start from these lists, so the
//! vocabulary is written once (common practice: one spelling per value, case-sensitive).

/// Declares an enum whose values have exact spellings; see the module documentation.
///
/// ```text
/// vocabulary! {
///     /// Doc.
///     #[derive(Debug, Clone, Copy, PartialEq, Eq)]
///     pub enum Example {
///         /// Doc of A.
///         A = "a",
///         /// Doc of B, also read as `bee`.
///         B = "b" | "bee",
///     }
/// }
/// ```
macro_rules! vocabulary {
    (
        $(#[$meta:meta])*
        $vis:vis enum $name:ident {
            $(
                $(#[$variant_meta:meta])*
                $variant:ident = $spelling:literal $(| $alias:literal)*
            ),+ $(,)?
        }
    ) => {
        $(#[$meta])*
        $vis enum $name {
            $( $(#[$variant_meta])* $variant, )+
        }

        impl $name {
            /// Every value, in declaration order.
            pub const ALL: [Self; [$($spelling),+].len()] = [$(Self::$variant),+];

            /// The canonical spelling of every value, in the order of `ALL`.
            pub const NAMES: [&'static str; [$($spelling),+].len()] = [$($spelling),+];

            /// Every spelling read: canonical names and aliases, in the order of `ALL`.
            pub const ACCEPTED: &'static [&'static str] = &[$($spelling, $($alias,)*)+];

            /// The canonical spelling.
            pub const fn as_str(self) -> &'static str {
                match self {
                    $( Self::$variant => $spelling, )+
                }
            }

            /// The value spelled exactly as `text` (a canonical name or an alias).
            pub fn from_name(text: &str) -> Option<Self> {
                match text {
                    $( $spelling $(| $alias)* => Some(Self::$variant), )+
                    _ => None,
                }
            }
        }

        impl $crate::physics::vocabulary::Vocabulary for $name {
            const VALUES: &'static [Self] = &Self::ALL;
            const CANONICAL: &'static [&'static str] = &Self::NAMES;
            const SPELLINGS: &'static [&'static str] = Self::ACCEPTED;
            fn name(self) -> &'static str {
                self.as_str()
            }
            fn named(text: &str) -> Option<Self> {
                Self::from_name(text)
            }
        }

        impl ::std::fmt::Display for $name {
            fn fmt(&self, f: &mut ::std::fmt::Formatter<'_>) -> ::std::fmt::Result {
                f.write_str(self.as_str())
            }
        }
    };
}

pub(crate) use vocabulary;

/// What every [`vocabulary!`] enum offers, for code generic over vocabularies (parsers, schema
/// enums, test generators).
pub trait Vocabulary: Copy + Sized + 'static {
    /// Every value, in declaration order.
    const VALUES: &'static [Self];
    /// The canonical spelling of every value, in the order of `VALUES`.
    const CANONICAL: &'static [&'static str];
    /// Every spelling read (canonical names and aliases).
    const SPELLINGS: &'static [&'static str];
    /// The canonical spelling.
    fn name(self) -> &'static str;
    /// The value spelled exactly as `text`.
    fn named(text: &str) -> Option<Self>;
}

#[cfg(test)]
mod tests {
    vocabulary! {
        /// A test vocabulary.
        #[derive(Debug, Clone, Copy, PartialEq, Eq)]
        enum Example {
            /// One.
            One = "one",
            /// Two, also read as `II`.
            Two = "two" | "II",
        }
    }

    #[test]
    fn spellings_are_exact_and_listed_once() {
        // Common practice: one canonical spelling per value, read case-sensitively.
        assert_eq!(Example::ALL, [Example::One, Example::Two]);
        assert_eq!(Example::NAMES, ["one", "two"]);
        assert_eq!(Example::ACCEPTED, ["one", "two", "II"]);
        assert_eq!(Example::from_name("II"), Some(Example::Two));
        assert_eq!(Example::from_name("Two"), None);
        assert_eq!(Example::from_name(" one"), None);
        assert_eq!(Example::Two.to_string(), "two");
        for value in Example::ALL {
            assert_eq!(Example::from_name(value.as_str()), Some(value));
        }
    }
}
