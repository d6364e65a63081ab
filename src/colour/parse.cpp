#include "colour/parse.h"

#include <charconv>
#include <cmath>
#include <vector>

#include "colour/convert.h"
#include "colour/palette.h"
#include "describe/suggest.h"

namespace forme {
namespace {

const char* const kForms = "write '#rrggbb', 'oklch(L C H)' or a palette colour such as 'estuary.1'";

ParsedColour fail(std::string error, std::string hint = {}) {
  return {std::nullopt, std::move(error), std::move(hint)};
}

std::string quote(std::string_view s) { return "'" + std::string(s) + "'"; }

std::string_view trim(std::string_view s) {
  auto space = [](char c) { return c == ' ' || c == '\t'; };
  while (!s.empty() && space(s.front())) s.remove_prefix(1);
  while (!s.empty() && space(s.back())) s.remove_suffix(1);
  return s;
}

bool starts_with_nocase(std::string_view s, std::string_view prefix) {
  if (s.size() < prefix.size()) return false;
  for (std::size_t i = 0; i < prefix.size(); ++i) {
    char c = s[i];
    if (c >= 'A' && c <= 'Z') c = static_cast<char>(c - 'A' + 'a');
    if (c != prefix[i]) return false;
  }
  return true;
}

int hex_value(char c) {
  if (c >= '0' && c <= '9') return c - '0';
  if (c >= 'a' && c <= 'f') return c - 'a' + 10;
  if (c >= 'A' && c <= 'F') return c - 'A' + 10;
  return -1;
}

ParsedColour parse_hex(std::string_view text) {
  std::string_view digits = text.substr(1);
  for (char c : digits) {
    if (hex_value(c) < 0) {
      return fail(quote(text) + " is not a colour: " + quote(std::string_view(&c, 1)) +
                  " is not a hex digit (0-9, a-f)");
    }
  }
  if (digits.size() == 3) {
    auto d = [&](std::size_t i) { return static_cast<std::uint8_t>(hex_value(digits[i]) * 17); };
    return {rgb8(d(0), d(1), d(2)), {}, {}};
  }
  if (digits.size() == 6) {
    auto d = [&](std::size_t i) {
      return static_cast<std::uint8_t>(hex_value(digits[i]) * 16 + hex_value(digits[i + 1]));
    };
    return {rgb8(d(0), d(2), d(4)), {}, {}};
  }
  return fail(quote(text) + " is not a colour: a hex colour has 3 or 6 digits after '#', found " +
              std::to_string(digits.size()));
}

/// A finite number filling all of `s`, or nothing.
std::optional<double> parse_number(std::string_view s) {
  double v = 0;
  auto [end, ec] = std::from_chars(s.data(), s.data() + s.size(), v);
  if (ec != std::errc() || end != s.data() + s.size() || !std::isfinite(v)) return std::nullopt;
  return v;
}

ParsedColour parse_oklch(std::string_view text) {
  std::string_view inner = text.substr(6);  // after "oklch("
  if (inner.empty() || inner.back() != ')') {
    return fail(quote(text) + " is not a colour: 'oklch(' needs a closing ')'",
                "write it as oklch(L C H), e.g. oklch(0.52 0.12 255)");
  }
  inner.remove_suffix(1);
  if (inner.find(',') != std::string_view::npos) {
    return fail(quote(text) + " is not a colour: separate the three oklch numbers with spaces, "
                "not commas");
  }
  std::vector<std::string_view> parts;
  for (std::size_t i = 0; i < inner.size();) {
    if (inner[i] == ' ' || inner[i] == '\t') {
      ++i;
      continue;
    }
    std::size_t j = inner.find_first_of(" \t", i);
    if (j == std::string_view::npos) j = inner.size();
    parts.push_back(inner.substr(i, j - i));
    i = j;
  }
  if (parts.size() != 3) {
    return fail(quote(text) + " is not a colour: oklch takes 3 numbers (lightness, chroma, hue), "
                "found " + std::to_string(parts.size()),
                "e.g. oklch(0.52 0.12 255) or oklch(52% 0.12 255)");
  }

  std::string_view l_text = parts[0];
  bool percent = !l_text.empty() && l_text.back() == '%';
  if (percent) l_text.remove_suffix(1);
  std::optional<double> l = parse_number(l_text);
  if (!l) return fail(quote(text) + ": lightness " + quote(parts[0]) + " is not a number");
  if (percent) *l /= 100.0;
  if (*l < 0.0 || *l > 1.0) {
    return fail(quote(text) + ": lightness " + quote(parts[0]) +
                " is out of range; write 0 to 1, or 0% to 100%");
  }

  std::optional<double> c = parse_number(parts[1]);
  if (!c) return fail(quote(text) + ": chroma " + quote(parts[1]) + " is not a number");
  if (*c < 0.0) {
    return fail(quote(text) + ": chroma " + quote(parts[1]) + " is negative",
                "to turn the hue round, add 180 to the hue instead");
  }

  std::string_view h_text = parts[2];
  if (h_text.size() > 3 && h_text.substr(h_text.size() - 3) == "deg") h_text.remove_suffix(3);
  std::optional<double> h = parse_number(h_text);
  if (!h) return fail(quote(text) + ": hue " + quote(parts[2]) + " is not a number of degrees");
  double hue = std::fmod(*h, 360.0);
  if (hue < 0) hue += 360.0;
  return {from_oklch({*l, *c, hue}), {}, {}};
}

/// "did you mean 'x'?" for a likely typo of one of `candidates`, else empty.
std::string suggest(std::string_view word, const std::vector<std::string>& candidates) {
  std::optional<std::string> near = nearest(word, candidates);
  return near ? "did you mean " + quote(*near) + "?" : std::string();
}

ParsedColour parse_name(std::string_view text) {
  std::size_t dot = text.find('.');
  std::string_view group = text.substr(0, dot);
  std::string_view item = dot == std::string_view::npos ? std::string_view() : text.substr(dot + 1);

  if (group == "ink") {
    std::vector<std::string> names;
    for (const NamedInk& ink : named_inks) {
      if (ink.name == item) return {ink.colour, {}, {}};
      names.emplace_back(ink.name);
    }
    std::string hint = suggest(item, names);
    if (hint.empty()) hint = "the inks are ink.text, ink.muted, ink.rule and ink.grid";
    return fail(quote(text) + " is not a colour: there is no ink called " + quote(item), hint);
  }

  const Palette* palette = find_palette(group);
  if (!palette) {
    std::vector<std::string> names = {"ink"};
    for (const Palette& p : all_palettes()) names.push_back(p.name);
    std::string hint = suggest(group, names);
    if (hint.empty()) hint = kForms;
    return fail(quote(text) + " is not a colour or a palette name", hint);
  }
  std::string range = "1 to " + std::to_string(palette->colours.size());
  if (item.empty()) {
    return fail(quote(text) + " is a palette, not one colour: name one of its colours, " +
                quote(std::string(group) + ".1") + " to " +
                quote(std::string(group) + "." + std::to_string(palette->colours.size())));
  }
  int k = 0;
  auto [end, ec] = std::from_chars(item.data(), item.data() + item.size(), k);
  if (ec != std::errc() || end != item.data() + item.size()) {
    return fail(quote(text) + ": after " + quote(std::string(group) + ".") +
                " comes a colour number, " + range);
  }
  if (k < 1 || k > static_cast<int>(palette->colours.size())) {
    return fail(quote(text) + ": palette " + quote(group) + " has colours " + range);
  }
  return {palette->colours[static_cast<std::size_t>(k - 1)], {}, {}};
}

}  // namespace

ParsedColour parse_colour(std::string_view text) {
  std::string_view t = trim(text);
  if (t.empty()) return fail("empty colour", kForms);
  if (t.front() == '#') return parse_hex(t);
  if (starts_with_nocase(t, "oklch(")) return parse_oklch(t);
  return parse_name(t);
}

}  // namespace forme
