#pragma once
/// Type sizes for the job a page does. One rule sets the base size (tick
/// labels, axis titles): text keeps the same visual angle, so it grows in
/// proportion to the distance it is read from, 8 pt at 40 cm (common
/// practice: 8-9 pt reads comfortably in print held at arm's length).
/// Each job then sets its other sizes as steps from the base, so the whole
/// page stays within the range that job is read at.
#include "describe/page_spec.h"

namespace forme {

/// The reading distance a job assumes, in centimetres (common practice):
/// a journal figure and a briefing or report page are held at 35-40 cm,
/// a poster is read from 1 to 2 m (100 cm assumed).
double reading_distance_cm(Job job);

/// Base size for a reading distance: 8 pt × distance / 40 cm, to 0.5 pt.
double base_size_for_distance(double distance_cm);

/// Sizes as multiples of the base.
struct TypeSteps {
  double title = 2.0, standfirst = 1.25, panel_title = 1.1, note = 0.9;
};

/// The steps of a job (common practice, chosen so a figure stays within
/// 7-9 pt and a briefing page within 8-11 pt at their base sizes).
TypeSteps type_steps(Job job);

}  // namespace forme
