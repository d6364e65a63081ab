#pragma once
/// A report description as plain values: sections of pages, each page a
/// page description (its own file or written inline), optionally repeated
/// once per distinct value of a column.
#include <optional>
#include <string>
#include <vector>

#include "describe/page_spec.h"
#include "describe/yaml_document.h"

namespace forme {

/// Repeat a page for each distinct value of one column of one of its tables.
struct RepeatSpec {
  Located table;   ///< a table name under the page's `tables`
  Located column;  ///< the column whose values each get a page
  enum class Order { as_read, sorted, listed } order = Order::as_read;
  std::vector<Located> listed;  ///< with Order::listed: the values, in order
  SourceLoc loc;
};

struct ReportPageEntry {
  /// The page description: its own file, or the inline mapping (then `file`
  /// and `text` are the report's, so messages point into the report).
  YamlDocument page;
  Located title;  ///< contents and bookmark entry; may hold placeholders; empty = the page's heading title
  std::optional<RepeatSpec> repeat;
  SourceLoc loc;
};

struct ReportSection {
  std::string title;
  std::vector<ReportPageEntry> pages;
  SourceLoc loc;
};

struct ReportSpec {
  std::string file;      ///< the description's path, for messages
  std::string base_dir;  ///< folder that page files are found from
  std::string title;
  Located running_head, running_foot;  ///< may hold $(section)
  bool cover = false;
  std::string cover_title;               ///< empty = the report's title
  std::vector<std::string> cover_lines;
  bool contents = true;
  std::string contents_title = "Contents";
  DocumentSpec document;
  Located language;  ///< BCP 47 tag: the PDF's /Lang, and each page's language unless it states one
  std::vector<ReportSection> sections;
};

}  // namespace forme
