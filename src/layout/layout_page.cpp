#include "layout/layout_page.h"

#include <algorithm>
#include <cmath>

#include "layout/aspect.h"
#include "layout/callout_targets.h"
#include "layout/axis_marks.h"
#include "layout/guides.h"
#include "layout/furniture.h"
#include "layout/grid_shape.h"
#include "layout/marks/marks.h"
#include "layout/marks/line_values.h"
#include "layout/movable_text.h"
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
};

GridMeasure measure_grid(const std::vector<PanelData>& panels, const std::vector<PanelAxes>& axes,
                         const PageStyle& st, double est_plot_width) {
  GridMeasure m;
  bool any_title = false, any_ytitle = false, any_xtitle = false;
  double last_x_half = 0;
  for (std::size_t i = 0; i < panels.size(); ++i) {
    const PanelAxes& a = axes[i];
    auto ylabels = shape_tick_labels(a.y, st);
    // Category names may not take more than 40% of a panel's width.
    m.y_label_width = std::max(m.y_label_width, std::min(widest(ylabels), est_plot_width * 0.4));
    auto xlabels = shape_tick_labels(a.x, st);
    double cat_w = a.x.kind == AxisKind::category ? est_plot_width / std::max<std::size_t>(1, a.x.categories.size()) * 0.95 : 0;
    m.x_band.push_back(x_label_band(a.x, st, cat_w));
    if (!xlabels.empty() && a.x.kind != AxisKind::category) last_x_half = std::max(last_x_half, xlabels.back().width / 2);
    any_title |= !panels[i].title.empty();
    any_ytitle |= !a.y.title.empty() && a.y.kind != AxisKind::category;
    any_xtitle |= !a.x.title.empty();
  }
  const double line = PageStyle::line_height(st.fonts.regular, st.label_size());
  const double title_line = PageStyle::line_height(st.fonts.bold, st.panel_title_size());
  // Panel title, y axis title, then room for the top tick label, which is
  // centred on the plot's top edge.
  m.top = (any_title ? title_line + st.base * 0.15 : 0) + (any_ytitle ? line : 0) + line * 0.55 + st.base * 0.15;
  m.x_title = any_xtitle ? line + st.base * 0.3 : 0;
  // Every panel gets the same inset, so it must hold the widest any kind on the page needs.
  double inset = 0;
  for (const auto& p : panels) inset = std::max(inset, marks_right_inset(p.kind, panels, st));
  m.right = std::max(inset, last_x_half) + st.base * 0.2;
  return m;
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
  const GridMeasure m = measure_grid(panels, axes, st, est_w * 0.8);
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
  if (plot_w < st.base * 4 || plot_h < st.base * 4) {
    const std::string size = "each plot would be " + std::to_string(static_cast<int>(plot_w)) + " × " +
                             std::to_string(static_cast<int>(plot_h)) + " pt";
    // Blame what takes the room: a heading or footer using most of the
    // page's height, else the grid itself.
    const bool heading_crowds = head >= foot && head > content.h * 0.4 && spec.heading_loc.line;
    const bool footer_crowds = foot > head && foot > content.h * 0.4 && spec.footer_loc.line;
    const auto pt = [](double v) { return std::to_string(static_cast<int>(std::lround(v))); };
    if (heading_crowds)
      throw InputError(spec.heading_loc,
                       "the heading takes " + pt(head) + " of the page's " + pt(content.h) +
                           " pt of height, so the panels do not fit (" + size + ")",
                       "shorten the heading, or use a larger sheet");
    if (footer_crowds)
      throw InputError(spec.footer_loc,
                       "the footer takes " + pt(foot) + " of the page's " + pt(content.h) +
                           " pt of height, so the panels do not fit (" + size + ")",
                       "shorten the source, notes or limitations, or use a larger sheet");
    throw InputError(spec.grid.loc, "the panels do not fit: " + size,
                     "use a larger sheet, fewer panels, smaller margins or a shorter heading");
  }

  const std::vector<PanelLooks> looks = assign_looks(spec, panels);
  const bool name_series = [&] {
    for (const auto& p : panels)
      if (p.series.size() > 1) return true;
    return false;
  }();

  std::vector<PanelMovables> movables;
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
    if (!panels[i].title.empty()) {
      auto t = shape_text(panels[i].title, st.fonts.bold, st.panel_title_size());
      const double asc = t.ascent;
      page.add(text_at(std::move(t), cell_left, ty + asc, Align::left, st.ink.text, TextRole::panel_title));
      ty += PageStyle::line_height(st.fonts.bold, st.panel_title_size()) + st.base * 0.15;
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
    draw_axis_labels(f, st, AxisLabelling{shows_x(static_cast<int>(i)), shows_y(c)}, page);
    if (!f.x.title.empty() && shows_x(static_cast<int>(i))) {
      auto t = shape_text(f.x.title, st.fonts.regular, st.label_size());
      const double asc = t.ascent;
      page.add(text_at(std::move(t), f.plot.cx(), f.plot.bottom() + row_band[static_cast<std::size_t>(r)] + st.base * 0.3 + asc,
                       Align::centre, st.ink.muted, TextRole::axis_title));
    }
    page.figures.back().end = page.items.size();
  }
  return {std::move(page), std::move(movables)};
}

DisplayPage layout_page(const PageSpec& spec, const std::vector<PanelData>& panels,
                        const std::vector<PanelAxes>& axes, const PageStyle& st, DiagnosticSink& warnings) {
  LaidOutPage laid = lay_out_boxes(spec, panels, axes, st, warnings);
  place_movable_text(laid.movables, st, laid.page, warnings);
  return std::move(laid.page);
}

}  // namespace forme
