// Shaped advances agree with the font file as read by an independent tool:
// fontTools (Debian's python3-fonttools) reads the cmap and hmtx tables of
// the bundled fonts; with kerning off, every glyph id and advance forme's
// shaping produces must match, within 0.01 em.
#include <catch2/catch.hpp>

#include <sstream>

#include "support/outside_tools.h"
#include "text/font.h"
#include "text/shaped_text.h"

using namespace forme::test;

namespace {

struct FtGlyph {
  unsigned gid = 0;
  double advance_em = 0;
};

// Asks fontTools for the nominal glyph and advance width of each character.
std::vector<FtGlyph> fonttools_advances(const std::string& font, const std::string& text) {
  TempDir dir;
  write_file(dir.file("text.txt"), text);
  write_file(dir.file("q.py"),
             "import sys\n"
             "from fontTools.ttLib import TTFont\n"
             "f = TTFont(sys.argv[1])\n"
             "cmap = f.getBestCmap(); upem = f['head'].unitsPerEm; hmtx = f['hmtx']\n"
             "for ch in open(sys.argv[2], encoding='utf-8').read():\n"
             "    name = cmap[ord(ch)]\n"
             "    print(f.getGlyphID(name), hmtx[name][0] / upem)\n");
  // Debian's python3 carries python3-fonttools; another python3 may be first on PATH.
  auto r = run("/usr/bin/python3 " + dir.file("q.py") + " '" + font + "' " + dir.file("text.txt"));
  INFO(r.err);
  REQUIRE(r.exit_code == 0);
  std::vector<FtGlyph> out;
  std::istringstream in(r.out);
  FtGlyph g;
  while (in >> g.gid >> g.advance_em) out.push_back(g);
  return out;
}

}  // namespace

TEST_CASE("glyph ids and advances match fontTools with kerning off", "[outside][text]") {
  const std::string dir = forme::find_font_dir(FORME_BINARY);
  const std::string sample = "Reservoir AVATAR To 1,234.50 kg -7% (Wy)";
  for (const char* file : {"NotoSans-Regular.ttf", "NotoSans-Bold.ttf"}) {
    INFO(file);
    const std::string path = dir + "/" + file;
    auto font = forme::Font::open(path);
    forme::ShapeOptions opt;
    opt.kerning = false;
    const double size = 10;
    auto shaped = forme::shape_text(sample, font, size, opt);
    auto expected = fonttools_advances(path, sample);
    REQUIRE(shaped.glyphs.size() == expected.size());
    double total = 0;
    for (std::size_t i = 0; i < expected.size(); ++i) {
      INFO("glyph " << i << " ('" << sample[i] << "')");
      CHECK(shaped.glyphs[i].index == expected[i].gid);
      CHECK(shaped.glyphs[i].advance / size == Approx(expected[i].advance_em).margin(0.01));
      total += expected[i].advance_em;
    }
    CHECK(shaped.width / size == Approx(total).margin(0.01));
  }
}

TEST_CASE("kerning changes advances of a kerned pair such as 'AV'", "[text]") {
  // Latin fonts kern "AV" (a classic kerning pair, common practice): with
  // kerning on the pair is narrower than the sum of the plain advances.
  auto font = forme::Font::open(forme::find_font_dir(FORME_BINARY) + "/NotoSans-Regular.ttf");
  forme::ShapeOptions off;
  off.kerning = false;
  double plain = forme::shape_text("AV", font, 10, off).width;
  double kerned = forme::shape_text("AV", font, 10).width;
  CHECK(kerned < plain);
}

TEST_CASE("tabular figures give every digit the same advance", "[text]") {
  auto font = forme::Font::open(forme::find_font_dir(FORME_BINARY) + "/NotoSans-Regular.ttf");
  forme::ShapeOptions tnum;
  tnum.tabular_figures = true;
  double w1 = forme::shape_text("1111", font, 10, tnum).width;
  double w0 = forme::shape_text("0000", font, 10, tnum).width;
  CHECK(w1 == Approx(w0).margin(1e-9));
}

TEST_CASE("negative numbers never draw the missing-glyph box", "[text]") {
  // Glyph 0 is .notdef in every TrueType font (OpenType spec, 'Recommendations
  // for OpenType fonts': the first glyph is the missing-character glyph).
  auto font = forme::Font::open(forme::find_font_dir(FORME_BINARY) + "/NotoSans-Regular.ttf");
  auto shaped = forme::shape_text("\u22125.0 and \u2212120", font, 10);
  REQUIRE(!shaped.glyphs.empty());
  for (const auto& g : shaped.glyphs) CHECK(g.index != 0);
}
