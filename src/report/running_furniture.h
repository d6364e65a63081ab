#pragma once
/// The running head and foot of a report page, set in the top and bottom
/// margins so they never meet the page's own content: the report's head
/// (left) and section (right) above, the report's foot (left) and
/// "page N of M" (right) below.
#include <string>

#include "describe/page_spec.h"
#include "layout/page_style.h"
#include "paint/display_list.h"

namespace forme {

struct RunningText {
  std::string head;     ///< left of the head line
  std::string section;  ///< right of the head line
  std::string foot;     ///< left of the foot line
  std::size_t page = 1, pages = 1;  ///< "page N of M", 1-based
};

/// "page N of M".
std::string page_n_of_m(std::size_t page, std::size_t pages);

/// The trimmed page: its trim box on a press sheet, else the whole sheet.
Rect trimmed(const DisplayPage& page);

/// The page's content box: the trimmed page less `margins`.
Rect content_box(const DisplayPage& page, const Margins& margins);

/// The height of one line of running text, ascender to descender, in points.
double running_text_height(const PageStyle& style);

/// Adds the running head and foot to `page`, centred in the top and bottom
/// `margins` of its trimmed page (the margins it was laid out with) and
/// running from the content's left edge to its right. A left text that would
/// meet the right one is left out (the right one, the section or page
/// number, matters more).
void add_running_text(DisplayPage& page, const Margins& margins, const RunningText& text, const PageStyle& style);

}  // namespace forme
