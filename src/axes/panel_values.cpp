#include "axes/axis.h"

namespace forme {

NumberFormat panel_value_format(const PanelData& p, bool along_x, const Axis& a) {
  std::vector<double> values;
  for (const auto& s : p.series) {
    const std::vector<double>& v = along_x ? s.x : s.y;
    values.insert(values.end(), v.begin(), v.end());
  }
  return value_format(values, a.values);
}

}  // namespace forme
