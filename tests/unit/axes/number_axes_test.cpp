// Number axes as resolve_axes builds them: tick labels from the step, log
// axes at powers of ten, titles that say "log scale" once, values beside
// marks in the data's own digits. Expected strings are worked by hand from
// the rules in axis.h, number_format.h and log_labels.h.
#include <catch2/catch.hpp>

#include <set>

#include "axes/axis.h"

namespace {

struct OnePanel {
  forme::PanelSpec spec;
  forme::PanelData data;
  forme::Axis y() {
    data.spec = &spec;
    forme::DiagnosticSink sink;
    return forme::resolve_axes({data}, forme::GridSpec{}, sink).front().y;
  }
};

OnePanel line(std::vector<double> ys, bool log = false) {
  OnePanel p;
  p.spec.kind = forme::ChartKind::line;
  p.spec.y_axis.log = log;
  p.data.kind = forme::ChartKind::line;
  std::vector<double> xs;
  for (std::size_t i = 0; i < ys.size(); ++i) xs.push_back(static_cast<double>(i));
  p.data.series.push_back(forme::Series{"", xs, ys});
  return p;
}

std::vector<std::string> labels(const forme::Axis& a) {
  std::vector<std::string> out;
  for (const auto& t : a.ticks) out.push_back(t.label);
  return out;
}

using S = std::vector<std::string>;

}  // namespace

TEST_CASE("a log axis from 1e-4 to 1e6 is labelled at its powers of ten", "[axes][log]") {
  const forme::Axis a = line({1e-4, 3e-2, 5, 870, 6.4e5, 1e6}, true).y();
  // 11 decades thinned to every second (at most 6 wanted ticks).
  CHECK(labels(a) == S{"10⁻⁴", "10⁻²", "10⁰", "10²", "10⁴", "10⁶"});
  CHECK(a.lo == 1e-4);
  CHECK(a.hi == 1e6);
  // The skipped decades are minor ticks.
  CHECK(a.minor == std::vector<double>{1e-3, 1e-1, 10, 1e3, 1e5});
  // Values beside marks are written in powers too, each against its own (worked by hand).
  const forme::NumberFormat v = forme::value_format({6.4e5, 1e-4}, a.values);
  CHECK(forme::format_number(6.4e5, v) == "6.4×10⁵");
  CHECK(forme::format_number(1e-4, v) == "1×10⁻⁴");
}

TEST_CASE("a log axis over twenty decades stays compact", "[axes][log]") {
  const forme::Axis a = line({1e-10, 2.5, 1e10}, true).y();
  CHECK(labels(a) == S{"10⁻¹⁰", "10⁻⁵", "10⁰", "10⁵", "10¹⁰"});
  for (const auto& t : a.ticks) CHECK(t.label.size() <= 14);  // UTF-8 bytes: "10" + at most 4 superscripts of 3
}

TEST_CASE("a narrow log axis is written in plain decimals without trailing zeros", "[axes][log]") {
  const forme::Axis a = line({0.001, 0.04, 1}, true).y();
  CHECK(labels(a) == S{"0.001", "0.01", "0.1", "1"});
  CHECK(a.minor.size() == 3 * 8);  // 2…9 in each of three decades
}

TEST_CASE("linear tick labels follow the step, and are all different", "[axes][format]") {
  // 61.0 … 61.66: step 0.1 or 0.2, one decimal on every tick, never 61 and 62.
  const forme::Axis a = line({61.0, 61.66, 61.21}).y();
  std::set<std::string> seen;
  for (const auto& t : a.ticks) {
    CHECK(t.label.find('.') == t.label.size() - 2);
    CHECK(seen.insert(t.label).second);
  }
  // A step of 0.5 needs one decimal and no more: 0.0 0.5 1.0 1.5.
  const forme::Axis b = line({0, 1.5}).y();
  CHECK(labels(b) == S{"0.0", "0.5", "1.0", "1.5"});
}

TEST_CASE("negative tick labels carry the minus sign U+2212", "[axes][format]") {
  const forme::Axis a = line({-2.35, 1.48}).y();
  REQUIRE(a.ticks.front().value < 0);
  CHECK(a.ticks.front().label.rfind("\u2212", 0) == 0);
  CHECK(a.ticks.front().label.find('-') == std::string::npos);
}

TEST_CASE("values beside marks are not held to the tick step", "[axes][format]") {
  const forme::Axis a = line({1.48, 0.67, -0.4}).y();
  // Ticks step 0.5 (one decimal); values keep their own two.
  const forme::NumberFormat v = forme::value_format({1.48, 0.67}, a.values);
  CHECK(forme::format_number(1.48, v) == "1.48");
  CHECK(forme::format_number(0.67, v) == "0.67");
  // The author's fixed decimals do hold.
  OnePanel fixed = line({1.48, 0.67});
  forme::NumberFormat one;
  one.decimals = 1;
  fixed.spec.y_axis.format = one;
  CHECK(forme::format_number(1.48, forme::value_format({1.48}, fixed.y().values)) == "1.5");
}

TEST_CASE("log axis titles say so once", "[axes][title]") {
  CHECK(forme::scale_title("Spores (per litre)", true) == "Spores (per litre, log scale)");
  CHECK(forme::scale_title("(index)", true) == "index, log scale");
  CHECK(forme::scale_title("Density", true) == "Density, log scale");
  CHECK(forme::scale_title("", true) == "Log scale");
  CHECK(forme::scale_title("Spores, log scale", true) == "Spores, log scale");
  CHECK(forme::scale_title("Density", false) == "Density");
  CHECK(forme::axis_title("Height (m)", "m") == "Height (m)");
  CHECK(forme::axis_title("Height", "m") == "Height (m)");
  OnePanel p = line({1, 100}, true);
  p.spec.y_axis.title = "Density";
  p.spec.y_axis.unit = "index";
  CHECK(p.y().title == "Density (index, log scale)");
}

TEST_CASE("fewer ticks on request keep the domain and style", "[axes][format]") {
  const forme::Axis a = line({0, 9.7}).y();
  REQUIRE(a.ticks.size() > 3);
  const forme::Axis b = forme::with_at_most_ticks(a, 3);
  CHECK(b.ticks.size() <= 3);
  CHECK(b.ticks.size() >= 2);
  CHECK(b.lo == a.lo);
  CHECK(b.hi == a.hi);
  for (const auto& t : b.ticks) CHECK((t.value >= a.lo && t.value <= a.hi));
  const forme::Axis l = line({1e-4, 1e6}, true).y();
  const forme::Axis l3 = forme::with_at_most_ticks(l, 3);
  // Every fifth power is the first round stride leaving at most 3 of 11 decades.
  CHECK(labels(l3) == S{"10⁰", "10⁵"});
}
