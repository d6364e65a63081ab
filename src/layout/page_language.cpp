#include "layout/page_language.h"

#include "text/language.h"

namespace forme {

namespace {

// Only text holding a right-to-left character can be set differently:
// lines of Latin, digits and punctuation alone keep their shaping.
bool holds_right_to_left(const ShapedText& t) {
  for (const auto& r : t.runs)
    if (r.rtl) return true;
  return false;
}

}  // namespace

void apply_page_language(DisplayPage& page, std::string_view language) {
  const BaseDirection base = language_direction(language);
  if (base == BaseDirection::from_text) return;
  for (auto& item : page.items) {
    auto* t = std::get_if<TextItem>(&item);
    if (!t || t->text.options.direction != BaseDirection::from_text || !holds_right_to_left(t->text)) continue;
    ShapeOptions o = t->text.options;
    o.direction = base;
    // The string as shaped (minus signs already made drawable in its font).
    t->text = shape_text(t->text.utf8, t->text.font, t->text.size, o);
  }
}

}  // namespace forme
