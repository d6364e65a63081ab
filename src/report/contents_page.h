#pragma once
/// Contents pages: the report's sections and pages with their page
/// numbers, typeset like the rest of the report. Every row has the same
/// pitch, so how many pages the contents take is known from the number of
/// rows alone, before any page number is (the numbers depend on it).
#include <string>
#include <vector>

#include "describe/page_spec.h"
#include "layout/page_style.h"
#include "paint/display_list.h"

namespace forme {

struct ContentsRow {
  std::string title;
  bool section = false;  ///< a section heading (bold), else a page (indented)
  std::size_t page = 0;  ///< 1-based page number shown on the right
};

/// The sheet contents pages are set on.
struct ContentsSheet {
  double width = 0, height = 0;  ///< points
  Margins margins;
};

/// How many pages `rows` rows take.
std::size_t contents_page_count(std::size_t rows, const ContentsSheet& sheet, const PageStyle& style);

/// The contents pages, headed `title`.
std::vector<DisplayPage> contents_pages(const std::string& title, const std::vector<ContentsRow>& rows,
                                        const ContentsSheet& sheet, const PageStyle& style);

}  // namespace forme
