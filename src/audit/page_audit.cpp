#include "audit/page_audit.h"

#include <set>

namespace forme {

void audit_page(const PageSpec& spec, const std::vector<PanelData>& panels, const std::vector<PanelAxes>& axes,
                DiagnosticSink& out) {
  if (spec.source.empty())
    out.warn(spec.loc, "the page has no source line",
             "add 'source:' saying where the data come from, so readers can check and reuse them");

  if (spec.grid.free_x || spec.grid.free_y)
    out.warn(spec.grid.scales_loc, "panels do not share one scale",
             "readers compare panels by position; the page notes the difference, but a shared scale "
             "(or a transform such as an index) lets them compare directly");

  std::set<const PanelSpec*> seen;
  for (std::size_t i = 0; i < panels.size(); ++i) {
    const PanelData& p = panels[i];
    const PanelSpec& s = *p.spec;
    const bool first_time = seen.insert(&s).second;  // one-panel-per panels share a spec
    if (p.series.size() > kMaxSeriesPerPanel && first_time)
      out.warn(s.series_by.loc.line ? s.series_by.loc : s.loc,
               std::to_string(p.series.size()) + " series in one panel are more than a reader can follow",
               "show them as small multiples: 'grid: {one-panel-per: " + s.series_by.value + "}'");
    const Axis& value = p.y_kind == AxisKind::category ? axes[i].x : axes[i].y;
    const AxisSpec& vspec = p.y_kind == AxisKind::category ? s.x_axis : s.y_axis;
    const bool stated = !p.transform.axis_title.empty() && !p.transform.keeps_unit;
    if (first_time && value.kind == AxisKind::number && vspec.unit.empty() && !stated &&
        (!vspec.format || vspec.format->style == NumberFormat::Style::plain) && vspec.format.value_or(NumberFormat{}).suffix.empty())
      out.warn(s.loc, "the value axis has no unit",
               std::string("add '") + (p.y_kind == AxisKind::category ? "x" : "y") +
                   "-unit:' (e.g. tonnes, % of capacity, people) so readers know what the numbers count");
  }
}

namespace {

// Text the page sets whatever its data: everything else labels the data.
bool is_furniture(TextRole r) {
  switch (r) {
    case TextRole::title: case TextRole::standfirst: case TextRole::panel_title: case TextRole::axis_title:
    case TextRole::tick_label: case TextRole::note: case TextRole::source: return true;
    default: return false;
  }
}

}  // namespace

void audit_layout(const PageSpec& spec, const DisplayPage& page, DiagnosticSink& out, const Limits& limits) {
  std::vector<const TextItem*> texts;
  std::size_t labels = 0;
  for (const auto& item : page.items)
    if (const auto* t = std::get_if<TextItem>(&item)) {
      texts.push_back(t);
      labels += is_furniture(t->role) ? 0 : 1;
    }
  if (labels > limits.labels) {
    out.report({Severity::error, spec.loc,
                "the page carries " + std::to_string(labels) + " labels, more than the " +
                    std::to_string(limits.labels) + " one page may hold",
                "label fewer points (or split the page), or raise the limit with '--limit labels=N'"});
    return;  // the pairwise checks below would take long and say little more
  }
  for (const TextItem* t : texts)
    if (t->text.size < 6)
      out.warn(spec.loc, "text '" + t->text.utf8 + "' is set at " + std::to_string(t->text.size).substr(0, 4) +
                             " pt, below the 6 pt that print can carry legibly",
               "raise 'type.size' or use a larger sheet");
  // Every pair; pages carry hundreds of texts at most.
  const double eps = 0.01;
  for (std::size_t i = 0; i < texts.size(); ++i)
    for (std::size_t j = i + 1; j < texts.size(); ++j) {
      const Rect a = texts[i]->box().inset(eps), b = texts[j]->box().inset(eps);
      if (a.overlaps(b))
        out.warn(spec.loc, "text '" + texts[i]->text.utf8 + "' overlaps '" + texts[j]->text.utf8 + "'",
                 "shorten the text, or give the panels more room");
    }
}

}  // namespace forme
