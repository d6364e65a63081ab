#include "paint/greyscale.h"

#include "colour/cvd.h"

namespace forme {

namespace {

void grey(Rgb& c) { c = to_greyscale(c); }
void grey(std::optional<Rgb>& c) {
  if (c) grey(*c);
}
void grey(std::optional<Stroke>& s) {
  if (s) grey(s->colour);
}

}  // namespace

DisplayPage in_greyscale(DisplayPage page) {
  for (auto& item : page.items) {
    if (auto* p = std::get_if<PathItem>(&item)) {
      grey(p->fill);
      grey(p->stroke);
      if (p->hatch) grey(p->hatch->ink);
    } else if (auto* c = std::get_if<CircleItem>(&item)) {
      grey(c->fill);
      grey(c->stroke);
    } else if (auto* t = std::get_if<TextItem>(&item)) {
      grey(t->colour);
    }
  }
  return page;
}

}  // namespace forme
