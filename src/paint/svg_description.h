#pragma once
/// A title and a description in an SVG file, for readers who cannot see it.
///
/// SVG 1.1 §5.4 ('desc' and 'title' elements): the first <title> and
/// <desc> children of the root <svg> element describe the whole drawing;
/// screen readers and search tools read them. Cairo 1.16 writes neither, so
/// they are inserted directly after the root element's start tag.
#include <string>
#include <string_view>

namespace forme {

/// Returns `svg` with <title>`title`</title> and <desc>`desc`</desc> (text
/// escaped for XML; empty ones left out) as the root element's first
/// children. Throws std::runtime_error when there is no root <svg> start tag.
std::string add_svg_description(std::string_view svg, std::string_view title, std::string_view desc);

/// `text` with &, < and > escaped for XML character data (XML 1.0 §2.4).
std::string xml_text(std::string_view text);

}  // namespace forme
