#pragma once
/// One interface for every output format. A painter receives whole pages
/// and writes them to a stream; formats differ only in how they open a
/// Cairo surface and finish the file.
#include <cstdint>
#include <memory>
#include <optional>
#include <ostream>
#include <string>
#include <vector>

#include "paint/display_list.h"

namespace forme {

enum class OutputFormat { pdf, svg, png };

/// A file carried inside a PDF (ISO 32000-1 §7.11.4 embedded file streams).
struct EmbeddedFile {
  std::string name;         ///< file name a reader saves it under
  std::string description;  ///< shown beside the name in a reader's attachment list
  std::string mime_type;    ///< e.g. "text/csv"
  std::string bytes;
};

/// A bookmark in a PDF's outline (ISO 32000-1 §12.3.3) that opens a page.
struct OutlineEntry {
  std::string title;
  std::size_t page = 0;  ///< 0-based page index
  int parent = -1;       ///< index of the parent entry in the outline list; -1 at the top
};

/// How a range of page labels counts (ISO 32000-1 §12.4.2, Table 159).
enum class PageNumberStyle { decimal, lower_roman };

/// Page labels from `first_page` on (until the next range): what a reader
/// shows as the page's number.
struct PageLabelRange {
  std::size_t first_page = 0;  ///< 0-based page index
  PageNumberStyle style = PageNumberStyle::decimal;
  int start = 1;  ///< number of the range's first page
};

struct DocumentInfo {
  std::string title;
  std::string creator = "forme";
  std::string author, subject;        ///< PDF document information
  std::vector<std::string> keywords;  ///< PDF document information, joined by ", "
  /// The text's language, a BCP 47 tag: the PDF catalog's /Lang (ISO
  /// 32000-1 §14.9.2) and the SVG root's lang and xml:lang; empty writes none.
  std::string language;
  /// What the page shows, in sentences: an SVG's <desc> (its <title> is `title`).
  std::string description;
  /// Files a PDF carries (PDF only; other formats ignore them).
  std::vector<EmbeddedFile> attachments;
  /// When the document was made, in seconds since 1970-01-01T00:00:00Z;
  /// nullopt dates it at the time of painting. Fixing it (the driver takes
  /// SOURCE_DATE_EPOCH) makes repeated PDF output byte-identical.
  std::optional<std::int64_t> creation_time;
  /// PDF only: bookmarks, parents before children.
  std::vector<OutlineEntry> outline;
  /// PDF only: page label ranges in page order; empty writes none.
  std::vector<PageLabelRange> page_labels;
};

class Painter {
 public:
  virtual ~Painter() = default;
  /// Paints one page. Pages after the first are only allowed in PDF.
  virtual void paint(const DisplayPage& page) = 0;
  /// Finishes the file; after this the stream holds the complete output.
  virtual void finish() = 0;
  /// Embeds `file` in the output, beside those of DocumentInfo::attachments
  /// (PDF only; other formats have nowhere to put it).
  virtual void attach(const EmbeddedFile& file) { (void)file; }
};

struct PaintOptions {
  double dpi = 150;  ///< raster resolution for PNG
  DocumentInfo info;
};

/// Creates the painter for `format`, writing to `out` (which must outlive it).
std::unique_ptr<Painter> make_painter(OutputFormat format, std::ostream& out, const PaintOptions& options);

/// Format from a file name's extension (.pdf, .svg, .png); nullopt if unknown.
std::optional<OutputFormat> format_for_path(const std::string& path);

}  // namespace forme
