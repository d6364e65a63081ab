#pragma once
/// Pages after the chart that set the plotted rows as tables, so a printed
/// report carries the numbers behind its chart.
///
/// Each panel's rows make one table under a bold heading: a bold header
/// row, then one line per row, numbers right-aligned in tabular figures so
/// their digits line up. Tables run down narrow columns across the sheet
/// (as many as fit side by side) and on to further pages; a table that
/// breaks repeats its heading, marked "continued", and its header row.
#include <vector>

#include "describe/page_spec.h"
#include "layout/page_style.h"
#include "paint/display_list.h"
#include "series/plotted_rows.h"

namespace forme {

/// One or more pages the size of the chart page; none when `tables` is empty.
std::vector<DisplayPage> data_table_pages(const PageSpec& spec, const std::vector<PlottedRows>& tables,
                                          const PageStyle& style);

}  // namespace forme
