#include "layout/content_height.h"

#include <set>

#include "layout/layout_page.h"

namespace forme {

// Everything on a page but the plot areas has a height fixed by the width
// (wrapped heading and footer, label bands), so one trial layout tells how
// much of the trial height went to the plots; each row of plots then takes
// exactly the height its width asks for.
double content_height(const PageSpec& spec, const std::vector<PanelData>& panels,
                      const std::vector<PanelAxes>& axes, const PageStyle& style) {
  DiagnosticSink trial_notes;  // the real layout reports them
  const DisplayPage trial = layout_page(spec, panels, axes, style, trial_notes);
  if (trial.plot_areas.empty()) return spec.sheet.height;
  std::set<double> rows;
  for (const auto& r : trial.plot_areas) rows.insert(r.y);
  const Rect& plot = trial.plot_areas.front();
  const double wanted = plot.w * 0.618;
  return spec.sheet.height + static_cast<double>(rows.size()) * (wanted - plot.h);
}

}  // namespace forme
