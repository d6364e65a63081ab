#include "describe/schema.h"

#include "colour/palette.h"

namespace forme {

namespace {

NodeSpec scalar(std::string_view what, ScalarType t, std::string_view doc = {}) {
  NodeSpec n;
  n.what = what;
  n.scalar_ok = true;
  n.scalar = t;
  n.doc = doc;
  return n;
}

NodeSpec choice(std::string_view what, std::vector<std::string_view> choices, std::string_view doc = {}) {
  NodeSpec n = scalar(what, ScalarType::choice, doc);
  n.choices = std::move(choices);
  return n;
}

NodeSpec mapping(std::string_view what, std::vector<KeySpec> keys, std::string_view doc = {}) {
  NodeSpec n;
  n.what = what;
  n.map_ok = true;
  n.keys = std::move(keys);
  n.doc = doc;
  return n;
}

NodeSpec list_of(std::string_view what, const NodeSpec* item, std::string_view doc = {}) {
  NodeSpec n;
  n.what = what;
  n.list_ok = true;
  n.item = item;
  n.doc = doc;
  return n;
}

struct Schema {
  NodeSpec text = scalar("a string", ScalarType::text);
  NodeSpec integer = scalar("a whole number", ScalarType::integer);
  NodeSpec length = scalar("a length with its unit, such as 18mm, 1.5cm, 0.5in or 9pt", ScalarType::length);
  NodeSpec boolean = scalar("true or false", ScalarType::boolean);
  NodeSpec number = scalar("a number", ScalarType::number);
  NodeSpec text_list = list_of("a list of strings", &text);

  NodeSpec margins_map = mapping("margins for each side",
      {{"top", &length, false, "space above the content"},
       {"right", &length, false, "space right of the content"},
       {"bottom", &length, false, "space below the content"},
       {"left", &length, false, "space left of the content"}});
  NodeSpec margins = [&] {
    NodeSpec n = margins_map;
    n.what = "a length, two or four lengths (\"18mm 15mm\"), or a mapping of sides";
    n.scalar_ok = true;
    n.scalar = ScalarType::text;
    return n;
  }();
  NodeSpec orientation = choice("portrait or landscape", {"portrait", "landscape"});
  NodeSpec value_labels = choice("true, false, or for line panels last, highest, lowest or extremes",
                                 {"true", "false", "last", "highest", "lowest", "extremes"});
  NodeSpec sheet = mapping("the sheet",
      {{"size", &text, false, "A0-A6, B0-B6, letter, legal, tabloid, single-column (89 mm wide), double-column (178 mm wide), or \"WIDTH x HEIGHT\" with units"},
       {"height", &length, false, "single-column and double-column figures: the height (default: as tall as the chart needs)"},
       {"height-ratio", &number, false, "single-column and double-column figures: height as a multiple of the width, e.g. 0.75"},
       {"orientation", &orientation, false, "portrait (default) or landscape"},
       {"margins", &margins, false, "space between the sheet edge and the content"},
       {"bleed", &length, false, "print shops: how far the background runs past the trimmed edge, e.g. 3mm (the PDF gets a BleedBox)"},
       {"crop-marks", &boolean, false, "print shops: marks outside the trimmed page showing where to cut (the PDF gets a TrimBox)"},
       {"slug", &text, false, "print shops: a job name, printed outside the trimmed page with the date and page number"},
       {"background", &text, false, "paper colour (#rrggbb, oklch(...), palette.k), run into the bleed"}},
      "paper size, orientation and margins");

  NodeSpec heading = mapping("the page heading",
      {{"title", &text, false, "the page's headline: what the reader should take away"},
       {"standfirst", &text, false, "one or two sentences under the title: what is shown, in what units"}});

  NodeSpec column_type = choice("number, date or text", {"number", "date", "text"});
  NodeSpec types = [&] {
    NodeSpec n = mapping("column types", {});
    n.any_key = &column_type;
    return n;
  }();
  NodeSpec table_map = mapping("a table",
      {{"file", &text, true, "CSV file, relative to the page description"},
       {"types", &types, false, "declared column types, overriding inference"},
       {"missing", &text_list, false, "cell texts that mean no value, e.g. [NA, n/a, \"-\"]; like empty cells, they leave a gap"}});
  NodeSpec table = [&] {
    NodeSpec n = table_map;
    n.what = "a CSV path or a mapping with 'file'";
    n.scalar_ok = true;
    return n;
  }();
  NodeSpec tables = [&] {
    NodeSpec n = mapping("named tables", {}, "data tables by name");
    n.any_key = &table;
    return n;
  }();

  NodeSpec scales = choice("shared, free-x, free-y or free", {"shared", "free-x", "free-y", "free"});
  NodeSpec tick_labels = choice("outer or every-panel", {"outer", "every-panel"});
  NodeSpec grid = mapping("the panel grid",
      {{"columns", &integer, false, "panels across"},
       {"scales", &scales, false, "shared (default): every panel on one scale; free-x, free-y, free: each panel its own (the page says so)"},
       {"tick-labels", &tick_labels, false, "outer: tick labels on the outer panels only (default for grids larger than 2 x 2); every-panel"},
       {"rows", &integer, false, "panels down"},
       {"one-panel-per", &text, false, "a column: one panel for each of its distinct values"},
       {"order", &text_list, false, "order of the one-panel-per values"},
       {"gap", &length, false, "space between panels"}});

  NodeSpec kind = choice("a chart kind", {"line", "vertical-bar", "horizontal-bar", "dot", "stacked-bar", "stacked-area"});
  NodeSpec format_style = choice("a number style", {"plain", "percent", "fraction-percent", "si", "power-of-ten"});
  NodeSpec format_map = mapping("a number format",
      {{"style", &format_style, false, "plain, percent (values in %), fraction-percent (0.25 = 25%), si (k, M, G), power-of-ten (1.5×10⁹; chosen by itself for very large or small values)"},
       {"decimals", &integer, false, "fixed digits after the decimal point"},
       {"thousands", &boolean, false, "group thousands (default true)"},
       {"prefix", &text, false, "written before each number, e.g. a currency sign"},
       {"suffix", &text, false, "written after each number"}});
  NodeSpec format = [&] {
    NodeSpec n = format_map;
    n.what = "a number style (plain, percent, fraction-percent, si, power-of-ten) or a format mapping";
    n.scalar_ok = true;
    n.scalar = ScalarType::choice;
    n.choices = format_style.choices;
    return n;
  }();
  NodeSpec where = [&] {
    NodeSpec n = mapping("row filters", {}, "keep rows whose column equals the value");
    n.any_key = &text;
    return n;
  }();
  NodeSpec axis_scale = choice("linear or log", {"linear", "log"});
  NodeSpec transform_kind = choice("a transform", {"index", "percent-change", "difference", "share"});
  NodeSpec transform = mapping("a transform of the values",
      {{"kind", &transform_kind, true, "index (base = 100), percent-change, difference (between two series), share (of the total at each x)"},
       {"base", &text, false, "index: the x value that becomes 100"},
       {"minus", &text, false, "difference: the series subtracted from every other"},
       {"lag", &integer, false, "percent-change: how many steps back to compare with (default 1)"}});
  NodeSpec reference = mapping("a reference line",
      {{"y", &number, false, "draw a horizontal line at this value"},
       {"x", &text, false, "draw a vertical line at this value (a number or a date)"},
       {"label", &text, false, "what the line marks, e.g. Target"}});
  NodeSpec references = list_of("a list of reference lines", &reference);
  NodeSpec trend = choice("none, line or line-with-equation", {"none", "line", "line-with-equation"});
  NodeSpec aspect = choice("an aspect rule", {"fill", "bank-median-slope", "bank-orientation"});
  NodeSpec refused = [&] {
    NodeSpec n = scalar("nothing: forme draws one value axis per panel", ScalarType::text);
    n.refused = "a second value axis lets the author choose where two lines cross; draw two panels, aligned on the same x, instead";
    return n;
  }();
  NodeSpec corner = choice("upper-left, upper-right, lower-left or lower-right",
                          {"upper-left", "upper-right", "lower-left", "lower-right"});
  NodeSpec callout = mapping("a callout",
      {{"text", &text, true, "the note, word-wrapped to 'width'"},
       {"x", &text, false, "with 'y': the point the note points at (a number, date or category)"},
       {"y", &text, false, "with 'x': the point the note points at"},
       {"category", &text, false, "the bar (category) the note points at"},
       {"from", &text, false, "with 'to': a stretch of x, drawn as a light band, that the note points at"},
       {"to", &text, false, "with 'from': the end of the stretch of x"},
       {"width", &length, false, "width the note is wrapped to (default: about 16 times the type size)"},
       {"corner", &corner, false, "pin the note to this corner of the plot instead of letting forme place it"},
       {"offset", &text, false, "pin the note's centre this far from its target: two lengths, right and up, e.g. \"20mm 8mm\""}});
  NodeSpec callouts = list_of("a list of callouts", &callout);
  NodeSpec palette_name = [&] {
    std::vector<std::string_view> names;
    for (const Palette& p : all_palettes()) names.push_back(p.name);
    return choice("the name of one of forme's palettes", std::move(names));
  }();
  NodeSpec colour = scalar("a colour: #rrggbb, #rgb, oklch(L C H), a palette entry such as estuary.2, or ink.text",
                           ScalarType::text);
  NodeSpec dash = choice("a dash", {"solid", "long", "short", "dotted", "dash-dot"});
  NodeSpec pattern = choice("a fill pattern", {"plain", "hatch", "back-hatch", "cross-hatch", "dots"});
  NodeSpec series_look_map = mapping("a series' look",
      {{"colour", &colour, false, "the series' colour"},
       {"dash", &dash, false, "line series: solid, long, short, dotted or dash-dot"},
       {"pattern", &pattern, false, "bar series: plain, hatch, back-hatch, cross-hatch or dots, drawn over the colour"}});
  NodeSpec series_look = [&] {
    NodeSpec n = series_look_map;
    n.what = "a colour, or a mapping with colour, dash and pattern";
    n.scalar_ok = true;
    n.scalar = ScalarType::text;
    return n;
  }();
  NodeSpec series_looks = [&] {
    NodeSpec n = mapping("looks by series name", {});
    n.any_key = &series_look;
    return n;
  }();
  std::vector<KeySpec> colour_keys() const {
    return {{"palette", &palette_name, false,
             "estuary (series colours, the default), fjord or heath (graded, light to dark, for ordered series), "
             "foreshore (diverging about a midpoint, for series named by numbers)"},
            {"midpoint", &number, false, "diverging palettes: the series value drawn in the neutral middle (default 0)"},
            {"patterns", &boolean, false,
             "also tell series apart without colour: dashes for lines, fill patterns for bars, chosen in order"},
            {"series", &series_looks, false, "colours, dashes and patterns of named series"}};
  }
  NodeSpec panel_colours = mapping("a panel's colours", colour_keys(), "this panel's palette and series looks");
  NodeSpec page_colours = [&] {
    NodeSpec n = mapping("the page's colours", colour_keys(), "the page's palette, series looks and greyscale printing");
    n.keys.push_back({"greyscale", &boolean, false,
                      "paint the page in greys of the same lightness, for black-and-white printing; "
                      "series must then differ in lightness, dash or pattern"});
    return n;
  }();
  NodeSpec panel = mapping("a panel",
      {{"kind", &kind, false, "line, vertical-bar, horizontal-bar, dot, stacked-bar (one upright bar per category, a segment per series) or stacked-area (a band per series laid on the ones before it)"},
       {"table", &text, false, "name of a table under 'tables'"},
       {"x", &text, false, "column for the horizontal position (categories for vertical bars)"},
       {"y", &text, false, "column for the vertical position (categories for horizontal bars and dots)"},
       {"series-by", &text, false, "column whose distinct values each make one series"},
       {"title", &text, false, "panel title"},
       {"where", &where, false, "keep only rows matching these column values"},
       {"x-title", &text, false, "horizontal axis title"},
       {"x-unit", &text, false, "unit of the horizontal axis"},
       {"x-format", &format, false, "number format of the horizontal axis"},
       {"y-title", &text, false, "vertical axis title"},
       {"y-unit", &text, false, "unit of the vertical axis"},
       {"y-format", &format, false, "number format of the vertical axis"},
       {"x-min", &text, false, "lowest value the horizontal axis must show"},
       {"x-max", &text, false, "highest value the horizontal axis must show"},
       {"y-min", &number, false, "lowest value the vertical axis must show (bars always include zero)"},
       {"y-max", &number, false, "highest value the vertical axis must show"},
       {"x-scale", &axis_scale, false, "linear (default) or log (strictly positive data only)"},
       {"y-scale", &axis_scale, false, "linear (default) or log (strictly positive data only)"},
       {"transform", &transform, false, "restate the values: index, percent-change, difference or share; the page says what was done"},
       {"references", &references, false, "reference lines: targets, thresholds, averages"},
       {"trend", &trend, false, "dot panels: least-squares trend line, optionally with its equation"},
       {"aspect", &aspect, false, "line panels: fill the cell, or bank the lines to 45 degrees"},
       {"value-labels", &value_labels, false, "bar panels (true): write each value inside its bar where it fits, else just beyond it; stacked bars: inside each segment where it fits, else left out with a warning; line panels: last (or true), highest, lowest or extremes: mark those points of each series and write their values beside them, placed clear of all other text"},
       {"label-points-by", &text, false, "dot panels: a column whose text names each point; names that find no room are left out with a warning"},
       {"label-priority", &text, false, "with label-points-by: a number column; points with higher values are named first"},
       {"callouts", &callouts, false, "notes joined by a leader line to a point, a bar or a stretch of x"},
       {"colours", &panel_colours, false, "this panel's palette and series looks (else the page's)"},
       {"y-right", &refused, false, "not available: forme refuses a second value axis"}});
  NodeSpec panels = list_of("a list of panels", &panel);

  NodeSpec document = mapping("document information",
      {{"author", &text, false, "who made the page, written into the PDF's document information"},
       {"subject", &text, false, "what the page is about, in a sentence, for the PDF's document information"},
       {"keywords", &text_list, false, "words a reader's search or a catalogue can find the file by"}},
      "document information for the PDF (its title is the heading's title)");
  NodeSpec source_link = [&] {
    NodeSpec n = list_of("a URL or a list of URLs", &text);
    n.scalar_ok = true;
    return n;
  }();
  NodeSpec data = mapping("what the file carries of the data",
      {{"attach", &boolean, false, "PDF: embed the rows each panel plots as CSV files (default true)"},
       {"table-page", &boolean, false, "PDF: set the plotted rows as a table on pages after the chart (default false)"}});

  NodeSpec job = choice("figure, briefing, report or poster", {"figure", "briefing", "report", "poster"});
  NodeSpec type = mapping("type settings",
      {{"size", &length, false, "base text size (tick labels, axis titles); overrides the job's"},
       {"job", &job, false, "figure (7-9 pt), briefing (8-11 pt), report, or poster (read from 1 m): sets the reading distance and the type steps"},
       {"reading-distance", &length, false, "how far away the page is read, e.g. 150cm: the base size is 8 pt at 40 cm, in proportion"},
       {"title-size", &length, false, "the heading's title"},
       {"standfirst-size", &length, false, "the standfirst"},
       {"panel-title-size", &length, false, "panel titles"},
       {"note-size", &length, false, "notes and the source line"}});
  NodeSpec marks = mapping("mark sizes",
      {{"line-width", &length, false, "data lines"},
       {"rule-width", &length, false, "gridlines, ticks and axis lines"},
       {"tick-length", &length, false, "tick marks"},
       {"dot-radius", &length, false, "dots"}});

  NodeSpec page = mapping("a page description",
      {{"sheet", &sheet, false, "paper size, orientation and margins"},
       {"heading", &heading, false, "title and standfirst"},
       {"tables", &tables, true, "data tables by name"},
       {"grid", &grid, false, "how panels are arranged"},
       {"panel", &panel, false, "the panel, or the template for one-panel-per grids and defaults for 'panels'"},
       {"panels", &panels, false, "panels listed one by one"},
       {"source", &text, false, "source line printed at the foot of the page"},
       {"notes", &text_list, false, "notes printed at the foot of the page"},
       {"source-link", &source_link, false, "where the source can be found; the PDF's source line links to it"},
       {"limitations", &text, false, "what the data cannot show, printed at the foot of the page"},
       {"document", &document, false, "author, subject and keywords for the PDF's document information"},
       {"data", &data, false, "whether the PDF carries the plotted rows: attached CSV files, a table page"},
       {"type", &type, false, "type sizes: by job, by reading distance, or each stated"},
       {"marks", &marks, false, "line widths, tick length and dot size (default: in proportion to the type)"},
       {"colours", &page_colours, false, "palette, series colours, dashes and patterns, greyscale printing"},
       {"language", &text, false, "the language the page's text is in, a BCP 47 tag such as en-GB, he or ar-EG: sets the PDF and SVG language and the direction lines of mixed scripts read in"}});

  // A report: many pages in one PDF, in sections, each page a page
  // description (a file or written inline), optionally one per value of a column.
  NodeSpec page_entry_page = [&] {
    NodeSpec n = page;
    n.what = "a page description file (relative to the report) or a page description written inline";
    n.scalar_ok = true;
    n.scalar = ScalarType::text;
    return n;
  }();
  NodeSpec page_order = [&] {
    NodeSpec n = list_of("sorted, as-read, or a list of values", &text);
    n.scalar_ok = true;
    n.scalar = ScalarType::choice;
    n.choices = {"sorted", "as-read"};
    return n;
  }();
  NodeSpec one_page_per = mapping("the column a page is repeated for",
      {{"table", &text, true, "name of a table under the page's 'tables'"},
       {"column", &text, true, "column of that table: one page for each of its distinct values, each page keeping only that value's rows; $(COLUMN) in the page's text is the value"},
       {"order", &page_order, false, "as-read (default: order of first appearance), sorted, or the values listed in order"}});
  NodeSpec page_entry = mapping("a report page",
      {{"page", &page_entry_page, true, "the page description: a file name, or the description written inline"},
       {"title", &text, false, "the page's entry in the contents and bookmarks (default: its heading's title)"},
       {"one-page-per", &one_page_per, false, "repeat the page for each distinct value of a column"}});
  NodeSpec page_entries = list_of("a list of report pages", &page_entry);
  NodeSpec section = mapping("a report section",
      {{"title", &text, true, "section title, in the contents, bookmarks and running head"},
       {"pages", &page_entries, true, "the section's pages, in order"}});
  NodeSpec sections = list_of("a list of sections", &section);
  NodeSpec cover = mapping("the report's cover",
      {{"title", &text, false, "the cover's title (default: the report's title)"},
       {"lines", &text_list, false, "lines under the title: who issues the report, for which period"}});
  NodeSpec report = mapping("a report description",
      {{"title", &text, true, "the report's title: PDF title, running head, contents"},
       {"running-head", &text, false, "text at the head of every page (default: the title); may use $(section)"},
       {"running-foot", &text, false, "text at the foot of every page, left of 'page N of M'"},
       {"cover", &cover, false, "a cover page first: the title set large and a few lines under it"},
       {"contents", &boolean, false, "start with contents pages listing sections and pages (default true)"},
       {"contents-title", &text, false, "heading of the contents pages (default: Contents)"},
       {"document", &document, false, "author, subject and keywords for the PDF's document information"},
       {"language", &text, false, "the language of the report's text, a BCP 47 tag such as en-GB: the PDF's language and each page's unless the page states its own"},
       {"sections", &sections, true, "the report's sections, in order"}});
};

}  // namespace

const NodeSpec& page_schema() {
  static const Schema schema;
  return schema.page;
}

const NodeSpec& report_schema() {
  static const Schema schema;
  return schema.report;
}

}  // namespace forme
