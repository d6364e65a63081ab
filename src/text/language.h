#pragma once
/// Language tags (BCP 47, RFC 5646) and the writing direction they imply.
///
/// A page or report may say what language its text is in. The tag goes
/// into the PDF catalog's /Lang (ISO 32000-1 §14.9.2) and the SVG root's
/// `lang` and `xml:lang`, and it sets the base direction of every line of
/// text (UAX #9 rule P3 is then replaced by the language's direction, as
/// higher-level protocol HL1 allows), so an English sentence that starts
/// with a Hebrew name still reads left to right.
#include <string>
#include <string_view>

#include "text/bidi.h"

namespace forme {

/// Why `tag` is not a well-formed language tag by the syntax of RFC 5646
/// §2.1 (language[-extlang][-script][-region]*(-variant)*(-extension)
/// [-privateuse], or a private-use tag "x-…"); empty when it is. Only the
/// shape is checked, not the IANA registry.
std::string language_tag_problem(std::string_view tag);

/// The base direction text in `tag`'s language is written in: the script
/// subtag's direction when one is given (Arab, Hebr, Syrc, Thaa, Nkoo,
/// Adlm, Rohg, Samr, Mand are right to left), else the language's usual
/// script (ar, he, fa, ur, yi, ps, sd, ug, ckb, dv, syr … are right to
/// left). An empty tag leaves the direction to the text
/// (BaseDirection::from_text).
BaseDirection language_direction(std::string_view tag);

}  // namespace forme
