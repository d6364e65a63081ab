#include "describe/read_page.h"

#include <cctype>
#include <charconv>
#include <climits>
#include <filesystem>
#include <sstream>

#include "base/geometry.h"
#include "colour/parse.h"
#include "describe/lengths.h"
#include "describe/schema.h"
#include "describe/validate.h"
#include "text/language.h"

namespace forme {

namespace {

class Builder {
 public:
  Builder(const YamlDocument& doc, const Limits& limits) : doc_(doc), limits_(limits) {}

  PageSpec build() {
    const YAML::Node& r = doc_.root;
    PageSpec p;
    p.file = doc_.file;
    p.loc = SourceLoc{doc_.file, 1, 1};
    std::filesystem::path base = std::filesystem::path(doc_.file).parent_path();
    p.base_dir = base.empty() ? "." : base.string();
    p.sheet = sheet(r["sheet"]);
    if (auto h = r["heading"]) {
      p.title = str(h["title"]);
      p.standfirst = str(h["standfirst"]);
      p.heading_loc = doc_.loc(h["title"] ? h["title"] : h["standfirst"] ? h["standfirst"] : h);
    }
    for (auto it = r["tables"].begin(); it != r["tables"].end(); ++it)
      p.tables.push_back(table(it->first.Scalar(), it->second, p.base_dir));
    p.grid = grid(r["grid"], r);
    PanelSpec defaults;
    defaults.loc = doc_.loc(r);
    if (auto pn = r["panel"]) defaults = panel(pn, defaults);
    if (auto list = r["panels"]) {
      if (list.size() > limits_.panels)
        throw InputError(doc_.loc(list), "more than " + std::to_string(limits_.panels) + " panels",
                         "split the panels over several pages");
      for (const auto& item : list) p.panels.push_back(panel(item, defaults));
    } else if (r["panel"]) {
      p.panels.push_back(defaults);
    }
    if (p.panels.empty())
      throw InputError(doc_.loc(r), "the page has no panels", "add a 'panel' (or a 'panels' list)");
    p.source = str(r["source"]);
    if (auto notes = r["notes"])
      for (const auto& n : notes) p.notes.push_back(n.Scalar());
    if (auto links = r["source-link"]) {
      if (links.IsScalar()) p.source_links.push_back(url(links));
      else
        for (const auto& l : links) p.source_links.push_back(url(l));
    }
    p.limitations = str(r["limitations"]);
    {  // The footer's longest part is the one to shorten when it crowds the panels.
      std::size_t notes_length = 0;
      for (const auto& n : p.notes) notes_length += n.size();
      const std::pair<const char*, std::size_t> parts[] = {
          {"source", p.source.size()}, {"notes", notes_length}, {"limitations", p.limitations.size()}};
      std::size_t longest = 0;
      for (const auto& [key, length] : parts)
        if (r[key] && (length > longest || !p.footer_loc.line)) {
          longest = std::max(longest, length);
          p.footer_loc = doc_.loc(r[key]);
        }
    }
    if (auto d = r["document"]) {
      p.document.author = str(d["author"]);
      p.document.subject = str(d["subject"]);
      if (auto k = d["keywords"])
        for (const auto& w : k) p.document.keywords.push_back(w.Scalar());
    }
    if (auto d = r["data"]) {
      if (d["attach"]) p.data.attach = d["attach"].Scalar() == "true";
      if (d["table-page"]) p.data.table_page = d["table-page"].Scalar() == "true";
    }
    if (auto t = r["type"]) p.type = type(t);
    if (auto m = r["marks"]) {
      auto get = [&](const char* key, double& into) {
        if (m[key]) into = positive_length(m[key], key);
      };
      get("line-width", p.type.line_width);
      get("rule-width", p.type.rule_width);
      get("tick-length", p.type.tick_length);
      get("dot-radius", p.type.dot_radius);
    }
    if (auto t = r["type"]; t && t["size"]) {
      p.type_size = *parse_length(t["size"].Scalar());
      if (p.type_size < 6)
        throw InputError(doc_.loc(t["size"]), "type size below 6pt cannot be read in print",
                         "use 6pt or more (common practice for printed figures)");
    }
    if (auto c = r["colours"]) {
      p.colours = colours(c, ColourSpec{});
      if (c["greyscale"]) p.greyscale = c["greyscale"].Scalar() == "true";
    }
    if (auto l = r["language"]) p.language = language(l);
    return p;
  }

 private:
  // A whole number read as the validator reads it: decimal, so "08" is 8
  // (yaml-cpp's as<int> takes it for bad octal and throws), and values past
  // int's range saturate so the range checks below refuse them.
  static int whole(const YAML::Node& n) {
    long v = 0;
    const std::string& s = n.Scalar();
    std::from_chars(s.data(), s.data() + s.size(), v);
    return v > INT_MAX ? INT_MAX : v < INT_MIN ? INT_MIN : static_cast<int>(v);
  }
  static std::string str(const YAML::Node& n) { return n && n.IsScalar() ? n.Scalar() : std::string(); }
  Located located(const YAML::Node& n) const {
    if (!n) return {};
    return {n.Scalar(), doc_.loc(n)};
  }

  // A language tag of the shape RFC 5646 §2.1 gives; the registry itself
  // is not consulted, so a well-formed tag for a rare language is kept.
  Located language(const YAML::Node& n) const {
    Located l = located(n);
    const std::string why = language_tag_problem(l.value);
    if (!why.empty())
      throw InputError(l.loc, "'" + l.value + "' is not a language tag: " + why,
                       "write a BCP 47 tag: a language, then optionally a script and a region, e.g. en-GB, he, ar-EG, sr-Latn");
    return l;
  }

  // A link target must name its scheme (RFC 3986 §3.1: a letter, then
  // letters, digits, '+', '-' or '.', then ':') and hold no spaces, which a
  // URI cannot contain unescaped (RFC 3986 §2).
  Located url(const YAML::Node& n) const {
    Located u = located(n);
    const std::string& v = u.value;
    std::size_t colon = v.find(':');
    bool ok = colon != std::string::npos && colon > 0 && std::isalpha(static_cast<unsigned char>(v[0]));
    for (std::size_t i = 1; ok && i < colon; ++i) {
      const unsigned char c = static_cast<unsigned char>(v[i]);
      ok = std::isalnum(c) || c == '+' || c == '-' || c == '.';
    }
    for (std::size_t i = 0; ok && i < v.size(); ++i) ok = static_cast<unsigned char>(v[i]) > ' ';
    if (!ok || colon + 1 == v.size())
      throw InputError(u.loc, "'" + v + "' is not a link a PDF reader can follow",
                       "write the whole address with its scheme, such as https://example.org/data, with no spaces");
    return u;
  }

  SheetSpec sheet(const YAML::Node& n) {
    SheetSpec s;
    s.size_name = "A4";
    s.loc = n ? doc_.loc(n) : SourceLoc{doc_.file, 1, 1};
    double w = mm_to_pt(210), h = mm_to_pt(297);
    if (n && n["size"]) {
      const std::string& name = n["size"].Scalar();
      if (auto column = column_width_mm(name)) {
        s.size_name = name;
        w = mm_to_pt(*column);
        h = column_height(n, w, s);
      } else if (auto known = find_sheet_size(name)) {
        s.size_name = known->name;
        w = mm_to_pt(known->width_mm);
        h = mm_to_pt(known->height_mm);
      } else if (auto custom = parse_custom_size(name)) {
        s.size_name = "custom";
        std::tie(w, h) = *custom;
      } else {
        throw InputError(doc_.loc(n["size"]), "unknown sheet size '" + name + "'",
                         "use A0-A6, B0-B6, letter, legal, tabloid, or WIDTH x HEIGHT such as \"120mm x 80mm\"");
      }
      if (w <= 0 || h <= 0)
        throw InputError(doc_.loc(n["size"]), "sheet width and height must be positive");
      // ISO 216's largest sheet is 4A0 (1682 × 2378 mm); PDF viewers limit
      // pages to 200 inches a side (ISO 32000-1 Annex C, a common limit).
      if (w > 200 * 72 || h > 200 * 72)
        throw InputError(doc_.loc(n["size"]), "sheet larger than 200 inches on a side",
                         "PDF readers cannot show pages that large");
    }
    if (n && n["orientation"] && n["orientation"].Scalar() == "landscape") {
      if (w < h) std::swap(w, h);
    } else if (n && n["orientation"] && n["orientation"].Scalar() == "portrait") {
      if (w > h) std::swap(w, h);
    }
    if (!column_width_mm(s.size_name))
      for (const char* key : {"height", "height-ratio"})
        if (n && n[key])
          throw InputError(doc_.loc(n[key]), std::string("'") + key + "' applies to single-column and double-column figures",
                           "give other sheets their height in the size, such as \"120mm x 80mm\"");
    s.width = w;
    s.height = h;
    // A figure's frame is the journal's business: small default margins.
    double d = column_width_mm(s.size_name) ? mm_to_pt(1.5) : mm_to_pt(15);
    s.margins = {d, d, d, d};
    if (n && n["margins"]) s.margins = margins(n["margins"]);
    s.margins_stated = n && n["margins"];
    const Margins& m = s.margins;
    if (m.left + m.right >= w * 0.8 || m.top + m.bottom >= h * 0.8) {
      if (n && n["margins"])
        throw InputError(doc_.loc(n["margins"]), "margins leave almost no room on the sheet",
                         "margins may take at most 80% of the sheet's width or height");
      // The default margins: point at the size that is too small for them.
      throw InputError(n && n["size"] ? doc_.loc(n["size"]) : s.loc,
                       "the sheet is too small for the default 15mm margins",
                       "give smaller 'margins' or a larger sheet");
    }
    if (n) s.press = press(n);
    return s;
  }

  // A column figure's height: stated, as a multiple of the width, or
  // (provisionally, twice the width) left to the content.
  double column_height(const YAML::Node& n, double w, SheetSpec& s) {
    if (n["height"] && n["height-ratio"])
      throw InputError(doc_.loc(n["height-ratio"]), "give 'height' or 'height-ratio', not both");
    if (n["height"]) {
      const double h = *parse_length(n["height"].Scalar());
      if (h <= 0) throw InputError(doc_.loc(n["height"]), "sheet height must be positive");
      return h;
    }
    if (n["height-ratio"]) {
      const double r = std::stod(n["height-ratio"].Scalar());
      if (!(r >= 0.1 && r <= 10))
        throw InputError(doc_.loc(n["height-ratio"]), "height-ratio must lie between 0.1 and 10",
                         "0.75 makes a figure three quarters as tall as it is wide");
      return w * r;
    }
    s.height_from_content = true;
    return w * 2;
  }

  double positive_length(const YAML::Node& n, const std::string& what) {
    const double v = *parse_length(n.Scalar());
    if (v <= 0) throw InputError(doc_.loc(n), what + " must be more than 0");
    return v;
  }

  // Stated sizes below 6 pt cannot be read in print (common practice).
  double type_size(const YAML::Node& n) {
    const double v = *parse_length(n.Scalar());
    if (v < 6)
      throw InputError(doc_.loc(n), "type size below 6pt cannot be read in print",
                       "use 6pt or more (common practice for printed figures)");
    return v;
  }

  TypeSpec type(const YAML::Node& n) {
    TypeSpec t;
    if (n["job"]) {
      const std::string& j = n["job"].Scalar();
      t.job = j == "figure" ? Job::figure : j == "briefing" ? Job::briefing : j == "report" ? Job::report : Job::poster;
    }
    if (n["reading-distance"]) {
      const double cm = *parse_length(n["reading-distance"].Scalar()) * 2.54 / 72;
      if (cm < 15 || cm > 2000)
        throw InputError(doc_.loc(n["reading-distance"]), "reading distance must lie between 15cm and 20m");
      t.reading_distance_cm = cm;
    }
    if (n["title-size"]) t.title = type_size(n["title-size"]);
    if (n["standfirst-size"]) t.standfirst = type_size(n["standfirst-size"]);
    if (n["panel-title-size"]) t.panel_title = type_size(n["panel-title-size"]);
    if (n["note-size"]) t.note = type_size(n["note-size"]);
    return t;
  }

  PressSpec press(const YAML::Node& n) {
    PressSpec p;
    if (n["bleed"]) {
      p.bleed = *parse_length(n["bleed"].Scalar());
      // Print shops ask for 3 to 5 mm; more than 25 mm is a slip of the unit
      // (common practice, recalled from printers' artwork guides).
      if (p.bleed < 0 || p.bleed > mm_to_pt(25))
        throw InputError(doc_.loc(n["bleed"]), "bleed must lie between 0mm and 25mm",
                         "print shops commonly ask for 3mm");
    }
    if (n["crop-marks"]) p.crop_marks = n["crop-marks"].Scalar() == "true";
    p.slug = str(n["slug"]);
    if (n["background"]) {
      ParsedColour c = parse_colour(n["background"].Scalar());
      if (!c.colour) throw InputError(doc_.loc(n["background"]), c.error, c.hint);
      p.background = c.colour;
    }
    return p;
  }

  Margins margins(const YAML::Node& n) {
    if (n.IsMap()) {
      Margins m;
      double d = mm_to_pt(15);
      m = {d, d, d, d};
      if (n["top"]) m.top = *parse_length(n["top"].Scalar());
      if (n["right"]) m.right = *parse_length(n["right"].Scalar());
      if (n["bottom"]) m.bottom = *parse_length(n["bottom"].Scalar());
      if (n["left"]) m.left = *parse_length(n["left"].Scalar());
      check_margins(m, n);
      return m;
    }
    std::istringstream words(n.Scalar());
    std::vector<double> v;
    std::string w;
    while (words >> w) {
      auto len = parse_length(w);
      if (!len)
        throw InputError(doc_.loc(n), "margin '" + w + "' is not a length", "write lengths with units, e.g. 18mm");
      v.push_back(*len);
    }
    Margins m;
    if (v.size() == 1) m = {v[0], v[0], v[0], v[0]};
    else if (v.size() == 2) m = {v[0], v[1], v[0], v[1]};  // vertical, horizontal
    else if (v.size() == 4) m = {v[0], v[1], v[2], v[3]};  // top, right, bottom, left (clockwise)
    else
      throw InputError(doc_.loc(n), "margins take one, two or four lengths",
                       "one for all sides; two for top/bottom and left/right; four clockwise from the top");
    check_margins(m, n);
    return m;
  }

  void check_margins(const Margins& m, const YAML::Node& n) {
    if (m.top < 0 || m.right < 0 || m.bottom < 0 || m.left < 0)
      throw InputError(doc_.loc(n), "margins cannot be negative");
  }

  TableSource table(const std::string& name, const YAML::Node& n, const std::string& base) {
    TableSource t;
    t.name = name;
    t.loc = doc_.loc(n);
    t.display_path = n.IsScalar() ? n.Scalar() : n["file"].Scalar();
    std::filesystem::path p(t.display_path);
    t.path = p.is_absolute() ? p.string() : (std::filesystem::path(base) / p).string();
    if (n.IsMap() && n["types"])
      for (auto it = n["types"].begin(); it != n["types"].end(); ++it) {
        const std::string& ty = it->second.Scalar();
        t.declared[it->first.Scalar()] =
            ty == "number" ? ColumnType::number : ty == "date" ? ColumnType::date : ColumnType::text;
      }
    if (n.IsMap() && n["missing"])
      for (const auto& m : n["missing"]) t.missing.push_back(m.Scalar());
    return t;
  }

  GridSpec grid(const YAML::Node& n, const YAML::Node& root) {
    GridSpec g;
    g.loc = n ? doc_.loc(n) : doc_.loc(root);
    if (!n) return g;
    if (n["columns"]) g.columns = positive(n["columns"], "grid columns");
    if (n["rows"]) g.rows = positive(n["rows"], "grid rows");
    if (n["one-panel-per"]) g.one_panel_per = located(n["one-panel-per"]);
    if (auto o = n["order"])
      for (const auto& v : o) g.order.push_back(v.Scalar());
    if (n["gap"]) g.gap = *parse_length(n["gap"].Scalar());
    if (auto s = n["scales"]) {
      const std::string& v = s.Scalar();
      g.free_x = v == "free-x" || v == "free";
      g.free_y = v == "free-y" || v == "free";
      g.scales_loc = doc_.loc(s);
    }
    if (auto t = n["tick-labels"]) g.outer_labels = t.Scalar() == "outer";
    return g;
  }

  int positive(const YAML::Node& n, const char* what) {
    int v = whole(n);
    if (v < 1 || v > 50)
      throw InputError(doc_.loc(n), std::string(what) + " must be between 1 and 50");
    return v;
  }

  static ChartKind kind(const std::string& k) {
    if (k == "vertical-bar") return ChartKind::vertical_bar;
    if (k == "horizontal-bar") return ChartKind::horizontal_bar;
    if (k == "dot") return ChartKind::dot;
    if (k == "stacked-bar") return ChartKind::stacked_bar;
    if (k == "stacked-area") return ChartKind::stacked_area;
    return ChartKind::line;
  }

  NumberFormat format(const YAML::Node& n) {
    NumberFormat f;
    auto style = [](const std::string& s) {
      if (s == "percent") return NumberFormat::Style::percent;
      if (s == "fraction-percent") return NumberFormat::Style::fraction_percent;
      if (s == "si") return NumberFormat::Style::si;
      if (s == "power-of-ten") return NumberFormat::Style::power_of_ten;
      return NumberFormat::Style::plain;
    };
    if (n.IsScalar()) {
      f.style = style(n.Scalar());
      return f;
    }
    if (n["style"]) f.style = style(n["style"].Scalar());
    if (n["decimals"]) {
      f.decimals = whole(n["decimals"]);
      if (f.decimals < 0 || f.decimals > 10)
        throw InputError(doc_.loc(n["decimals"]), "decimals must be between 0 and 10");
    }
    if (n["thousands"]) f.thousands = n["thousands"].Scalar() == "true";
    if (n["prefix"]) f.prefix = n["prefix"].Scalar();
    if (n["suffix"]) f.suffix = n["suffix"].Scalar();
    return f;
  }

  PanelSpec panel(const YAML::Node& n, PanelSpec p) {
    p.loc = doc_.loc(n);
    if (n["kind"]) p.kind = kind(n["kind"].Scalar());
    if (n["table"]) p.table = located(n["table"]);
    if (n["x"]) p.x = located(n["x"]);
    if (n["y"]) p.y = located(n["y"]);
    if (n["series-by"]) p.series_by = located(n["series-by"]);
    if (n["title"]) p.title = n["title"].Scalar();
    if (n["x-title"]) p.x_axis.title = n["x-title"].Scalar();
    if (n["x-unit"]) p.x_axis.unit = n["x-unit"].Scalar();
    if (n["x-format"]) p.x_axis.format = format(n["x-format"]);
    if (n["y-title"]) p.y_axis.title = n["y-title"].Scalar();
    if (n["y-unit"]) p.y_axis.unit = n["y-unit"].Scalar();
    if (n["y-format"]) p.y_axis.format = format(n["y-format"]);
    axis_extras(n, "x", p.x_axis);
    axis_extras(n, "y", p.y_axis);
    if (auto t = n["transform"]) p.transform = transform(t);
    if (auto refs = n["references"]) {
      p.references.clear();
      for (const auto& r : refs) p.references.push_back(reference(r));
    }
    if (auto v = n["value-labels"]) {
      using V = PanelSpec::LineValues;
      const std::string& w = v.Scalar();
      p.value_labels = w != "false";
      p.line_values = w == "highest" ? V::highest : w == "lowest" ? V::lowest : w == "extremes" ? V::extremes : V::last;
      p.line_values_named = w != "true" && w != "false";
      p.value_labels_loc = doc_.loc(v);
    }
    if (n["label-points-by"]) p.label_points_by = located(n["label-points-by"]);
    if (n["label-priority"]) p.label_priority = located(n["label-priority"]);
    if (!p.label_priority.empty() && p.label_points_by.empty())
      throw InputError(p.label_priority.loc, "'label-priority' orders point names, but the panel names no points",
                       "add 'label-points-by:' naming the column whose text labels each point");
    if (auto list = n["callouts"]) {
      p.callouts.clear();
      for (const auto& c : list) p.callouts.push_back(callout(c));
    }
    if (auto t = n["trend"])
      p.trend = t.Scalar() == "line" ? Trend::line : t.Scalar() == "line-with-equation" ? Trend::line_with_equation : Trend::none;
    if (auto a = n["aspect"]) {
      p.aspect = a.Scalar() == "bank-median-slope"  ? AspectRule::bank_median_slope
                 : a.Scalar() == "bank-orientation" ? AspectRule::bank_orientation
                                                    : AspectRule::fill;
      p.aspect_loc = doc_.loc(a);
    }
    if (auto c = n["colours"]) p.colours = colours(c, p.colours);
    if (auto w = n["where"]) {
      p.where.clear();
      for (auto it = w.begin(); it != w.end(); ++it)
        p.where.push_back({located(it->first), located(it->second)});
    }
    if (p.value_labels && p.line_values_named && p.kind != ChartKind::line)
      throw InputError(p.value_labels_loc, "value-labels names points of a line, but this is not a line panel",
                       "write 'value-labels: true' to write the values on bars");
    return p;
  }

  // Palette, midpoint, patterns and series looks; values not given keep
  // those of `c` (the panel template's).
  ColourSpec colours(const YAML::Node& n, ColourSpec c) {
    c.loc = doc_.loc(n);
    if (n["palette"]) c.palette = located(n["palette"]);
    if (auto m = n["midpoint"]) {
      c.midpoint = std::stod(m.Scalar());
      c.midpoint_loc = doc_.loc(m);
    }
    if (auto pt = n["patterns"]) {
      c.patterns = pt.Scalar() == "true";
      c.patterns_loc = doc_.loc(pt);
    }
    if (auto list = n["series"])
      for (auto it = list.begin(); it != list.end(); ++it) {
        SeriesLookSpec look;
        look.name = located(it->first);
        const YAML::Node v = it->second;  // a copy: the iterator hands out a temporary pair
        const YAML::Node colour_node = v.IsScalar() ? v : v["colour"];
        if (colour_node) {
          ParsedColour parsed = parse_colour(colour_node.Scalar());
          if (!parsed.colour)
            throw InputError(doc_.loc(colour_node), parsed.error, parsed.hint);
          look.colour = parsed.colour;
          look.colour_loc = doc_.loc(colour_node);
        } else {
          look.colour_loc = look.name.loc;
        }
        if (v.IsMap() && v["dash"]) look.dash = dash(v["dash"].Scalar());
        if (v.IsMap() && v["pattern"]) look.pattern = pattern(v["pattern"].Scalar());
        std::erase_if(c.series, [&](const SeriesLookSpec& s) { return s.name.value == look.name.value; });
        c.series.push_back(std::move(look));
      }
    return c;
  }

  static DashStyle dash(const std::string& d) {
    if (d == "long") return DashStyle::long_dash;
    if (d == "short") return DashStyle::short_dash;
    if (d == "dotted") return DashStyle::dotted;
    if (d == "dash-dot") return DashStyle::dash_dot;
    return DashStyle::solid;
  }

  static FillPattern pattern(const std::string& p) {
    if (p == "hatch") return FillPattern::hatch;
    if (p == "back-hatch") return FillPattern::back_hatch;
    if (p == "cross-hatch") return FillPattern::cross_hatch;
    if (p == "dots") return FillPattern::dots;
    return FillPattern::plain;
  }

  void axis_extras(const YAML::Node& n, const std::string& axis, AxisSpec& a) {
    if (auto v = n[axis + "-min"]) a.min = located(v);
    if (auto v = n[axis + "-max"]) a.max = located(v);
    if (auto v = n[axis + "-scale"]) {
      a.log = v.Scalar() == "log";
      a.scale_loc = doc_.loc(v);
    }
  }

  TransformSpec transform(const YAML::Node& n) {
    TransformSpec t;
    t.loc = doc_.loc(n);
    const std::string& k = n["kind"].Scalar();
    t.kind = k == "index"            ? TransformSpec::Kind::index
             : k == "percent-change" ? TransformSpec::Kind::percent_change
             : k == "difference"     ? TransformSpec::Kind::difference
                                     : TransformSpec::Kind::share;
    if (n["base"]) t.base = located(n["base"]);
    if (n["minus"]) t.minus = located(n["minus"]);
    if (n["lag"]) {
      t.lag = whole(n["lag"]);
      if (t.lag < 1) throw InputError(doc_.loc(n["lag"]), "lag must be 1 or more");
    }
    if (t.kind == TransformSpec::Kind::index && t.base.empty())
      throw InputError(t.loc, "an index needs its base", "add 'base:' naming the x value that becomes 100");
    if (t.kind == TransformSpec::Kind::difference && t.minus.empty())
      throw InputError(t.loc, "a difference needs the series to subtract", "add 'minus:' naming a series");
    return t;
  }

  // A callout names exactly one target: a point (x and y), a category, or
  // a stretch of x (from and to).
  CalloutSpec callout(const YAML::Node& n) {
    CalloutSpec c;
    c.loc = doc_.loc(n);
    c.text = str(n["text"]);
    if (c.text.empty()) throw InputError(c.loc, "a callout needs its 'text'");
    if (n["x"]) c.x = located(n["x"]);
    if (n["y"]) c.y = located(n["y"]);
    if (n["category"]) c.category = located(n["category"]);
    if (n["from"]) c.from = located(n["from"]);
    if (n["to"]) c.to = located(n["to"]);
    const bool point = !c.x.empty() || !c.y.empty(), cat = !c.category.empty(), span = !c.from.empty() || !c.to.empty();
    if (point + cat + span != 1)
      throw InputError(c.loc, "a callout points at exactly one thing",
                       "give 'x' and 'y' (a point), 'category' (a bar), or 'from' and 'to' (a stretch of x)");
    if (point && (c.x.empty() || c.y.empty()))
      throw InputError(c.loc, "a callout at a point needs both 'x' and 'y'");
    if (span && (c.from.empty() || c.to.empty()))
      throw InputError(c.loc, "a callout on a stretch of x needs both 'from' and 'to'");
    c.target = point ? CalloutSpec::Target::point : cat ? CalloutSpec::Target::category : CalloutSpec::Target::span;
    if (auto w = n["width"]) {
      c.width = *parse_length(w.Scalar());
      if (c.width < 18) throw InputError(doc_.loc(w), "a callout narrower than 18pt cannot hold a word", "use 25mm or more");
    }
    if (auto k = n["corner"]) {
      const std::string& v = k.Scalar();
      c.corner = v == "upper-left"    ? CalloutSpec::Corner::upper_left
                 : v == "upper-right" ? CalloutSpec::Corner::upper_right
                 : v == "lower-left"  ? CalloutSpec::Corner::lower_left
                                      : CalloutSpec::Corner::lower_right;
    }
    if (auto o = n["offset"]) {
      std::istringstream words(o.Scalar());
      std::vector<double> v;
      std::string w;
      while (words >> w) {
        auto len = parse_length(w);
        if (!len) throw InputError(doc_.loc(o), "offset '" + w + "' is not a length", "write lengths with units, e.g. \"20mm 8mm\"");
        v.push_back(*len);
      }
      if (v.size() != 2)
        throw InputError(doc_.loc(o), "an offset takes two lengths", "right then up from the target, e.g. \"20mm -8mm\"");
      c.offset = Point{v[0], v[1]};
    }
    if (c.offset && c.corner != CalloutSpec::Corner::none)
      throw InputError(doc_.loc(n["offset"]), "a callout is pinned by 'corner' or by 'offset', not both");
    return c;
  }

  ReferenceLine reference(const YAML::Node& n) {
    ReferenceLine r;
    r.loc = doc_.loc(n);
    if (n["y"]) r.y = std::stod(n["y"].Scalar());
    if (n["x"]) r.x = located(n["x"]);
    if (n["label"]) r.label = n["label"].Scalar();
    if (r.y.has_value() == !r.x.empty())
      throw InputError(r.loc, "a reference line needs exactly one of 'y' and 'x'");
    return r;
  }

  const YamlDocument& doc_;
  const Limits& limits_;
};

}  // namespace

PageSpec build_page_spec(const YamlDocument& doc, const Limits& limits) { return Builder(doc, limits).build(); }

std::optional<PageSpec> read_page(const std::string& path, std::vector<Diagnostic>& errors, const Limits& limits) {
  YamlDocument doc = load_yaml_file(path, limits);
  errors = validate_document(doc, page_schema());
  if (!errors.empty()) return std::nullopt;
  return build_page_spec(doc, limits);
}

}  // namespace forme
