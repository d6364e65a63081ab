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

}  // namespace forme
