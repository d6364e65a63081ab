#include "layout/layout_page.h"

#include <algorithm>
#include <cmath>
#include <set>

#include "layout/aspect.h"
#include "layout/callout_targets.h"
#include "layout/axis_marks.h"
#include "layout/guides.h"
#include "layout/furniture.h"
#include "layout/grid_shape.h"
#include "layout/marks/marks.h"
#include "layout/marks/line_values.h"
#include "layout/movable_text.h"
#include "layout/name_fit.h"
#include "layout/series_looks.h"
#include "layout/text_items.h"

namespace forme {

namespace {

// Small multiples larger than 2 × 2 label only their outer edges: the scale
// is shared, so inner panels repeat nothing the reader needs.
bool outer_labels_only(const GridSpec& spec, const GridShape& g) {
  return spec.outer_labels.value_or(g.columns * g.rows > 4);
}

// What forme did to the values, in words, once each.
std::string extended_standfirst(const PageSpec& spec, const std::vector<PanelData>& panels) {
  std::string out = spec.standfirst;
  std::vector<std::string> said;
  for (const auto& p : panels)
    if (!p.transform.sentence.empty() && std::find(said.begin(), said.end(), p.transform.sentence) == said.end())
      said.push_back(p.transform.sentence);
  for (const auto& s : said) out += (out.empty() ? "" : " ") + s;
  return out;
}

// A page whose panels do not share a scale says so, in the footer.
std::vector<std::string> scale_notes(const std::vector<PanelAxes>& axes) {
  bool own_x = false, own_y = false;
  for (const auto& a : axes) own_x |= a.x.own_scale, own_y |= a.y.own_scale;
  if (own_x && own_y) return {"Scales differ between panels: each panel's axes have their own range; compare positions only within a panel."};
  if (own_y) return {"Scales differ between panels: each panel's vertical axis has its own range; compare heights only within a panel."};
  if (own_x) return {"Scales differ between panels: each panel's horizontal axis has its own range."};
  return {};
}

// The footer's notes: where the data have gaps (each said once), then the scales.
std::vector<std::string> page_notes(const std::vector<PanelData>& panels, const std::vector<PanelAxes>& axes) {
  std::vector<std::string> out;
  for (const auto& p : panels)
    if (!p.gap_note.empty() && std::find(out.begin(), out.end(), p.gap_note) == out.end()) out.push_back(p.gap_note);
  for (auto& n : scale_notes(axes)) out.push_back(std::move(n));
  return out;
}

SeriesColours colours_of(const PanelLooks& looks) {
  SeriesColours out;
  for (const auto& [name, look] : looks.series) out[name] = look.colour;
  return out;
}

// Everything that is measured once for the whole grid, so every panel gets
// the same inner box.
struct GridMeasure {
  double y_label_width = 0;  ///< widest y tick label (or category name)
  std::vector<double> x_band;  ///< per panel: height of the x tick label band
  double x_title = 0;        ///< height of the x axis title line
  double top = 0;            ///< panel title + y title lines
  double right = 0;          ///< line-end labels or overhang of the last x label
  std::vector<NameFit> x_names;  ///< per panel: category names under the plot, fitted to their slots
  std::vector<std::vector<ShapedText>> titles;  ///< per panel: its title's lines, within the panel's width
};

std::vector<std::string> tick_texts(const Axis& a) {
  std::vector<std::string> out;
  for (const auto& t : a.ticks) out.push_back(t.label);
  return out;
}

GridMeasure measure_grid(const std::vector<PanelData>& panels, const std::vector<PanelAxes>& axes,
                         const PageStyle& st, double panel_width) {
  GridMeasure m;
  for (const PanelAxes& a : axes) {
    // A column of category names takes at most 38% of its panel's width, so
    // the bars keep the most of it (common practice); longer names wrap.
    // Numbers are never cut, so their column is as wide as they are.
    const double w = widest(shape_tick_labels(a.y, st));
    m.y_label_width = std::max(m.y_label_width, a.y.kind == AxisKind::category ? std::min(w, panel_width * 0.38) : w);
  }
  // Every panel gets the same inset, so it must hold the widest any kind on the page needs.
  double inset = 0;
  for (const auto& p : panels) inset = std::max(inset, marks_right_inset(p.kind, panels, axes, st));
  // The plot's width as the grid will give it (less the y labels and the
  // line-end names beside it), so category names are fitted to the slots
  // they will really have.
  const double est_plot_width = std::max(1.0, panel_width - m.y_label_width - st.base * 0.3 - inset - st.base * 0.2);
  bool any_title = false, any_ytitle = false, any_xtitle = false;
  double last_x_half = 0;
  std::size_t title_lines = 0;
  for (std::size_t i = 0; i < panels.size(); ++i) {
    const PanelAxes& a = axes[i];
    auto xlabels = shape_tick_labels(a.x, st);
    NameFit x_names;
    if (a.x.kind == AxisKind::category) {
      // Each name gets its slot less the gap to its neighbours, up to three
      // lines; names too long even so are thinned before they are cut.
      const double slot = est_plot_width / static_cast<double>(std::max<std::size_t>(1, a.x.ticks.size()));
      x_names = fit_name_row(tick_texts(a.x), st.fonts.regular, st.label_size(), st.min_size(), slot, label_gap(st), 3);
    }
    m.x_band.push_back(x_label_band(a.x, st, a.x.kind == AxisKind::category ? &x_names : nullptr));
    m.x_names.push_back(std::move(x_names));
    if (!xlabels.empty() && a.x.kind != AxisKind::category) last_x_half = std::max(last_x_half, xlabels.back().width / 2);
    any_title |= !panels[i].title.empty();
    m.titles.push_back(panels[i].title.empty()
                           ? std::vector<ShapedText>{}
                           : wrap_within(panels[i].title, st.fonts.bold, st.panel_title_size(), st.min_size(),
                                         panel_width, "the panel title", panels[i].spec->loc));
    title_lines = std::max(title_lines, m.titles.back().size());
    any_ytitle |= !a.y.title.empty() && a.y.kind != AxisKind::category;
    any_xtitle |= !a.x.title.empty();
  }
  const double line = PageStyle::line_height(st.fonts.regular, st.label_size());
  const double title_line = PageStyle::line_height(st.fonts.bold, st.panel_title_size());
  // Panel title, y axis title, then room for the top tick label, which is
  // centred on the plot's top edge.
  m.top = (any_title ? title_line * static_cast<double>(title_lines) + st.base * 0.15 : 0) + (any_ytitle ? line : 0) + line * 0.55 + st.base * 0.15;
  m.x_title = any_xtitle ? line + st.base * 0.3 : 0;
  m.right = std::max(inset, last_x_half) + st.base * 0.2;
  return m;
}

// The room a grid of panels was given, for saying why it does not fit.
struct NoFit {
  GridShape g;
  double plot_w, plot_h;  ///< what each plot would get
  Rect content;
  double head, foot;      ///< heading and footer heights
  double left, right;     ///< all columns' tick label insets; one column's right inset
  double top, bottom;     ///< one row's titles; all rows' x labels and titles
  double gap;
};

// Which element takes the room and what would fit, located at that element.
[[noreturn]] void explain_no_fit(const PageSpec& spec, const PageStyle& st, const NoFit& n) {
  const auto pt = [](double v) { return std::to_string(static_cast<int>(std::lround(v))); };
  const double least = st.base * 4;  // a plot narrower or shorter than four ems cannot show data
  const int cells = n.g.columns * n.g.rows;
  const std::string each = cells == 1 ? "the plot" : "each of " + std::to_string(cells) + " panels";
  if (n.plot_h < least) {
    // Everything stacked down the page, largest first.
    const double rows_own = n.bottom + n.top * n.g.rows + n.gap * (n.g.rows - 1);
    const std::string rows_word = n.g.rows == 1 ? "the panel's" : "the " + std::to_string(n.g.rows) + " rows'";
    std::string taker = rows_word + " titles and tick labels take " + pt(rows_own);
    SourceLoc at = spec.grid.loc;
    std::string hint;
    if (n.head >= n.foot && n.head >= rows_own && spec.heading_loc.line) {
      taker = "the heading takes " + pt(n.head);
      at = spec.heading_loc;
      hint = "shorten the heading, ";
    } else if (n.foot > n.head && n.foot >= rows_own && spec.footer_loc.line) {
      taker = "the footer takes " + pt(n.foot);
      at = spec.footer_loc;
      hint = "shorten the source, notes or limitations, ";
    }
    // Rows that would fit with the room each row's furniture takes.
    const double per_row = least + n.top + n.bottom / n.g.rows + n.gap;
    const int rows_fit = static_cast<int>(std::floor((n.content.h - n.head - n.foot + n.gap) / per_row));
    if (n.g.rows > 1 && rows_fit >= 1) hint += "use " + std::to_string(rows_fit) + (rows_fit == 1 ? " row" : " rows") +
                                                 " (more 'columns'), ";
    throw InputError(at,
                     "the panels do not fit: " + taker + " of the " + pt(n.content.h) + " pt the sheet has inside its margins, so " +
                         each + " would get " + pt(n.plot_h) + " pt of plot height (at least " + pt(least) + " pt needed)",
                     hint + "use a taller sheet, or a smaller type size");
  }
  const double labels = n.left + n.right * n.g.columns;
  const int cols_fit =
      static_cast<int>(std::floor((n.content.w + n.gap) / (least + labels / n.g.columns + n.gap)));
  std::string hint = n.g.columns > 1 && cols_fit >= 1
                         ? "use " + std::to_string(cols_fit) + (cols_fit == 1 ? " column" : " columns") + ", "
                         : std::string();
  throw InputError(spec.grid.loc,
                   "the panels do not fit: the tick labels and names beside the plots take " + pt(labels) + " of the " +
                       pt(n.content.w) + " pt the sheet has across, so " + each + " would get " + pt(n.plot_w) +
                       " pt of plot width (at least " + pt(least) + " pt needed)",
                   hint + "use a wider sheet, shorter category names or a smaller type size");
}

// Category names beside the plot, in the name column, each within its band.
NameFit fit_name_column(const PanelData& p, const PlotFrame& f, double column, const PageStyle& st) {
  const double band = f.band_y();
  NameFit fit = fit_names(tick_texts(f.y), st.fonts.regular, st.label_size(), st.min_size(), column,
                          band - label_gap(st) * 0.5);
  if (fit.line_height > band + 1e-9) {
    const auto pt = [](double v) { return std::to_string(static_cast<int>(std::lround(v))); };
    throw InputError(p.spec->y.loc,
                     "the " + std::to_string(f.y.ticks.size()) + " categories of '" + p.spec->y.value +
                         "' get " + pt(band) + " pt of height each, less than one line of their names at the smallest size (" +
                         pt(fit.line_height) + " pt)",
                     "show fewer categories per panel, or use a taller sheet or fewer rows of panels");
  }
  return fit;
}

// A name cut with "…" is said once, at the table row it comes from.
void say_shortened(const PanelData& p, const NameFit& fit, std::set<std::string>& warned, DiagnosticSink& warnings) {
  for (const FittedName& n : fit.names) {
    if (!n.shortened || !warned.insert(n.full).second) continue;
    std::string set;
    for (const auto& l : n.lines) set += (set.empty() ? "" : " ") + l.utf8;
    auto row = p.category_rows.find(n.full);
    warnings.report({Severity::warning, row != p.category_rows.end() ? row->second : p.spec->loc,
                     "the name '" + n.full + "' is shortened to '" + set + "' to fit its " +
                         std::to_string(static_cast<int>(std::lround(fit.box_width))) +
                         " pt column; the alt text and the attached rows keep it whole",
                     "give it a shorter name in the data, or the panel more width (fewer columns, a wider sheet)"});
  }
}

// A stretch of x a callout points at: a pale band the height of the plot.
void draw_callout_band(const Rect& band, DisplayPage& page) {
  page.add(filled_rect(band, rgb8(0xf3, 0xec, 0xd9)));  // a warm pale sand, lighter than any series colour
}

}  // namespace

LaidOutPage lay_out_boxes(const PageSpec& spec, const std::vector<PanelData>& panels,
                          const std::vector<PanelAxes>& axes, const PageStyle& st, DiagnosticSink& warnings) {
  DisplayPage page;
  page.width = spec.sheet.width;
  page.height = spec.sheet.height;
  page.title = spec.title;
  const Margins& mg = spec.sheet.margins;
  Rect content{mg.left, mg.top, page.width - mg.left - mg.right, page.height - mg.top - mg.bottom};

  const double head = set_heading(spec, extended_standfirst(spec, panels), st, content, page);
  const double foot = set_footer(spec, st, content, page, page_notes(panels, axes));
  Rect area{content.x, content.y + head, content.w, content.h - head - foot};

  const GridShape g = grid_shape(spec.grid, static_cast<int>(panels.size()));
  const bool outer = outer_labels_only(spec.grid, g);
  const bool own_x = spec.grid.free_x, own_y = spec.grid.free_y;
  const double gap = spec.grid.gap > 0 ? spec.grid.gap : st.base * 2.2;
  const double est_w = (area.w - gap * (g.columns - 1)) / g.columns;
  const GridMeasure m = measure_grid(panels, axes, st, est_w);
  const double pad = st.base * 0.3;

  // Column c's left inset holds y labels; row r's bottom inset holds x labels.
  // A panel on a scale of its own always carries its own tick labels.
  auto shows_y = [&](int c) { return !outer || own_y || c == 0; };
  auto shows_x = [&](int index) {
    if (!outer || own_x) return true;
    return index + g.columns >= static_cast<int>(panels.size());  // nothing below it
  };
  std::vector<double> left(static_cast<std::size_t>(g.columns)), bottom(static_cast<std::size_t>(g.rows));
  double sum_left = 0, sum_bottom = 0;
  for (int c = 0; c < g.columns; ++c) sum_left += left[static_cast<std::size_t>(c)] = shows_y(c) ? m.y_label_width + pad : 0;
  // Each row is as deep as its deepest x label band needs.
  std::vector<double> row_band(static_cast<std::size_t>(g.rows), 0);
  for (int r = 0; r < g.rows; ++r) {
    bool any = false;
    for (int c = 0; c < g.columns; ++c) {
      int i = r * g.columns + c;
      if (i < static_cast<int>(panels.size()) && shows_x(i)) {
        any = true;
        row_band[static_cast<std::size_t>(r)] = std::max(row_band[static_cast<std::size_t>(r)], m.x_band[static_cast<std::size_t>(i)]);
      }
    }
    sum_bottom += bottom[static_cast<std::size_t>(r)] = any ? row_band[static_cast<std::size_t>(r)] + m.x_title : st.base * 0.4;
  }
  double plot_w = (area.w - sum_left - g.columns * m.right - gap * (g.columns - 1)) / g.columns;
  double plot_h = (area.h - sum_bottom - g.rows * m.top - gap * (g.rows - 1)) / g.rows;
  // Banking shapes the shared inner box, within the cell it has.
  const PanelSpec& first = *panels.front().spec;
  if (first.kind == ChartKind::line)
    if (auto alpha = banked_aspect(panels, axes, first.aspect)) {
      if (*alpha * plot_w <= plot_h) plot_h = *alpha * plot_w;
      else plot_w = plot_h / *alpha;
      warnings.report({Severity::note, first.aspect_loc,
                       "lines banked to 45 degrees: plot areas are " + std::to_string(static_cast<int>(std::lround(plot_w))) +
                           " x " + std::to_string(static_cast<int>(std::lround(plot_h))) + " pt (height/width " +
                           std::to_string(*alpha).substr(0, 5) + ")",
                       {}});
    }
  if (plot_w < st.base * 4 || plot_h < st.base * 4)
    explain_no_fit(spec, st, NoFit{g, plot_w, plot_h, content, head, foot, sum_left, m.right, m.top, sum_bottom, gap});

  std::vector<PanelLooks> looks = assign_looks(spec, panels);
  const bool name_series = [&] {
    for (const auto& p : panels)
      if (p.series.size() > 1) return true;
    return false;
  }();

  std::vector<PanelMovables> movables;
  std::set<std::string> warned;  // shortened names, said once per page
  for (std::size_t i = 0; i < panels.size(); ++i) {
    const int c = static_cast<int>(i) % g.columns, r = static_cast<int>(i) / g.columns;
    double x = area.x, y = area.y;
    for (int k = 0; k < c; ++k) x += left[static_cast<std::size_t>(k)] + plot_w + m.right + gap;
    for (int k = 0; k < r; ++k) y += m.top + plot_h + bottom[static_cast<std::size_t>(k)] + gap;
    const double cell_left = x;
    x += left[static_cast<std::size_t>(c)];
    y += m.top;
    PlotFrame f{{x, y, plot_w, plot_h}, axes[i].x, axes[i].y};
    page.plot_areas.push_back(f.plot);
    page.figures.push_back({page.items.size(), page.items.size(), {}});

    // Panel title, then the y axis title with its unit, above the plot.
    double ty = y - m.top;
    if (!m.titles[i].empty()) {
      for (const ShapedText& t : m.titles[i]) {
        page.add(text_at(t, cell_left, ty + t.ascent, Align::left, st.ink.text, TextRole::panel_title));
        ty += PageStyle::line_height(st.fonts.bold, st.panel_title_size());
      }
      ty += st.base * 0.15;
    }
    if (!f.y.title.empty() && f.y.kind != AxisKind::category && shows_y(c)) {
      auto t = shape_text(f.y.title, st.fonts.regular, st.label_size());
      const double asc = t.ascent;
      page.add(text_at(std::move(t), cell_left, ty + asc, Align::left, st.ink.muted, TextRole::axis_title));
    }

    PanelMovables& moving = movables.emplace_back();
    moving.plot = f.plot;
    for (const CalloutSpec& cs : panels[i].spec->callouts) {
      const CalloutTarget t = resolve_callout_target(cs, panels[i], f);
      if (t.band) draw_callout_band(*t.band, page);  // behind the grid and the data
      moving.callouts.push_back({&cs, t.anchor});
    }
    for (const PointName& n : panels[i].point_names) {
      const Series& s = panels[i].series[n.series];
      moving.names.push_back({{f.px(s.x[n.point]), f.py(s.y[n.point])}, st.dot_radius() * 1.2, n.text, n.priority, n.loc});
    }
    draw_axis_backdrop(f, st, page);
    const SeriesColours colours = colours_of(looks[i]);
    MarkContext ctx{panels[i], f, st, colours, name_series, &warnings};
    ctx.looks = &looks[i];
    draw_marks(ctx, page);
    if (panels[i].kind == ChartKind::line && panels[i].spec->value_labels)
      for (PointNameRequest& v : line_value_labels(ctx, page)) moving.names.push_back(std::move(v));
    draw_trend_lines(ctx, page, moving.choices);
    draw_reference_lines(ctx, page, moving.choices);
    AxisLabelling labelling{shows_x(static_cast<int>(i)), shows_y(c), &m.x_names[i], nullptr};
    NameFit y_names;
    if (f.y.kind == AxisKind::category && shows_y(c)) {
      y_names = fit_name_column(panels[i], f, m.y_label_width, st);
      labelling.y_names = &y_names;
    }
    for (const NameFit* fit : {labelling.x_names, labelling.y_names})
      if (fit && (fit == labelling.y_names || labelling.x_labels)) say_shortened(panels[i], *fit, warned, warnings);
    draw_axis_labels(f, st, labelling, page);
    if (!f.x.title.empty() && shows_x(static_cast<int>(i))) {
      auto t = shape_text(f.x.title, st.fonts.regular, st.label_size());
      const double asc = t.ascent;
      page.add(text_at(std::move(t), f.plot.cx(), f.plot.bottom() + row_band[static_cast<std::size_t>(r)] + st.base * 0.3 + asc,
                       Align::centre, st.ink.muted, TextRole::axis_title));
    }
    page.figures.back().end = page.items.size();
  }
  return {std::move(page), std::move(movables), std::move(looks)};
}

DisplayPage layout_page(const PageSpec& spec, const std::vector<PanelData>& panels,
                        const std::vector<PanelAxes>& axes, const PageStyle& st, DiagnosticSink& warnings) {
  LaidOutPage laid = lay_out_boxes(spec, panels, axes, st, warnings);
  place_movable_text(laid.movables, st, laid.page, warnings);
  return std::move(laid.page);
}

}  // namespace forme
