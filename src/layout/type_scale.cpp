#include "layout/type_scale.h"

#include <cmath>

namespace forme {

double reading_distance_cm(Job job) {
  switch (job) {
    case Job::figure: return 35;
    case Job::poster: return 100;
    default: return 40;
  }
}

double base_size_for_distance(double distance_cm) { return std::round(8.0 * distance_cm / 40.0 * 2.0) / 2.0; }

TypeSteps type_steps(Job job) {
  switch (job) {
    // 7 pt base: notes 7, panel titles 8, title 9.
    case Job::figure: return {9.0 / 7, 8.0 / 7, 8.0 / 7, 1.0};
    // 8 pt base: notes 8, panel titles 9, standfirst 9.5, title 11.
    case Job::briefing: return {11.0 / 8, 9.5 / 8, 9.0 / 8, 1.0};
    // Report and poster pages: a headline twice the base.
    default: return {};
  }
}

}  // namespace forme
