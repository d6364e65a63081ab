#pragma once
/// Sizes and inks a page is set in. Everything scales from one base type
/// size, so a poster and a journal figure keep the same proportions.
#include <algorithm>
#include <vector>

#include "colour/rgb.h"
#include "layout/type_scale.h"
#include "text/font.h"

namespace forme {

struct Inks {
  Rgb text;    ///< titles and labels
  Rgb muted;   ///< tick labels, axis titles, notes (still ≥ 4.5:1 on paper)
  Rgb rule;    ///< baselines and axis lines
  Rgb grid;    ///< gridlines: light, behind the data
  Rgb paper;
};

struct PageStyle {
  FontSet fonts;
  double base = 8;  ///< base type size in points
  Inks ink;
  std::vector<Rgb> series;  ///< colours for series, in order of first appearance

  TypeSteps steps;  ///< other sizes as multiples of `base`
  TypeSpec stated;  ///< sizes the page states, which win (0 = not stated)

  double title_size() const { return or_else(stated.title, base * steps.title); }
  double standfirst_size() const { return or_else(stated.standfirst, base * steps.standfirst); }
  double panel_title_size() const { return or_else(stated.panel_title, base * steps.panel_title); }
  double label_size() const { return base; }
  /// The smallest size labels may shrink to when they would not fit: the
  /// job's note size, the least it sets (so a page stays within its job's
  /// range, and a poster's names stay readable from where it is read), and
  /// never under 6 pt, the least print carries legibly (common practice).
  double min_size() const { return std::min(base, std::max(6.0, note_size())); }
  double note_size() const { return or_else(stated.note, base * steps.note < 6 ? 6 : base * steps.note); }
  double line_width() const { return or_else(stated.line_width, base * 0.19); }   ///< data lines
  double rule_width() const { return or_else(stated.rule_width, base * 0.07); }   ///< gridlines and ticks
  double tick_length() const { return or_else(stated.tick_length, base * 0.35); }
  double dot_radius() const { return or_else(stated.dot_radius, base * 0.3); }

  /// Height of a line of text as PDF readers measure it: the font's
  /// ascender plus descender. Lines are stacked at least this far apart so
  /// their boxes never overlap.
  static double line_height(const FontRef& font, double size) {
    return (font->ascent_em() + font->descent_em()) * size;
  }

 private:
  static double or_else(double stated_size, double derived) { return stated_size > 0 ? stated_size : derived; }
};

/// Base type size for a sheet: 8 pt on A4/Letter, growing with the square
/// root of the sheet's area (common practice: text scales with viewing
/// distance, which grows more slowly than sheet area). Never below 6 pt.
double base_size_for_sheet(double width_pt, double height_pt);

}  // namespace forme
