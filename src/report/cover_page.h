#pragma once
/// A report's cover: its title set large a third of the way down the sheet,
/// and under it a few lines (who issues it, for which period), set by forme
/// like every other page.
#include <string>
#include <vector>

#include "layout/page_style.h"
#include "paint/display_list.h"
#include "report/contents_page.h"

namespace forme {

DisplayPage cover_page(const std::string& title, const std::vector<std::string>& lines, const ContentsSheet& sheet,
                       const PageStyle& style);

}  // namespace forme
