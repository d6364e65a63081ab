#include "paint/svg_description.h"

#include <stdexcept>

namespace forme {

std::string xml_text(std::string_view text) {
  std::string out;
  out.reserve(text.size());
  for (char c : text) {
    if (c == '&') out += "&amp;";
    else if (c == '<') out += "&lt;";
    else if (c == '>') out += "&gt;";
    else out += c;
  }
  return out;
}

std::string add_svg_description(std::string_view svg, std::string_view title, std::string_view desc) {
  if (title.empty() && desc.empty()) return std::string(svg);
  // The root start tag: "<svg" followed by white space or '>', before any
  // other element (Cairo writes only an XML declaration before it).
  std::size_t at = 0;
  for (;;) {
    at = svg.find("<svg", at);
    if (at == std::string_view::npos) throw std::runtime_error("SVG file: no root <svg> element");
    const char next = at + 4 < svg.size() ? svg[at + 4] : '\0';
    if (next == '>' || next == ' ' || next == '\n' || next == '\t' || next == '\r') break;
    at += 4;
  }
  const std::size_t end = svg.find('>', at);
  if (end == std::string_view::npos) throw std::runtime_error("SVG file: unterminated <svg> start tag");
  std::string out(svg.substr(0, end + 1));
  out += '\n';
  if (!title.empty()) out += "<title>" + xml_text(title) + "</title>\n";
  if (!desc.empty()) out += "<desc>" + xml_text(desc) + "</desc>";
  // Cairo follows the start tag with a newline of its own.
  if (desc.empty() && !out.empty() && out.back() == '\n') out.pop_back();
  out += svg.substr(end + 1);
  return out;
}

}  // namespace forme
