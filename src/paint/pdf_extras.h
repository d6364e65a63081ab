#pragma once
/// What a finished PDF gets after Cairo: its date, embedded files, link
/// annotations, print boxes, figure alternate text and page labels.
///
/// Cairo 1.16 cannot embed files, and its link tags are only sound inside a
/// tagged structure forme does not write, so both are added to the finished
/// bytes as an incremental update (pdf_update.h), as is everything else
/// Cairo cannot say:
///  - the document's /CreationDate (ISO 32000-1 §7.9.4): Cairo 1.16 writes
///    a date passed to it without the `D:` prefix the standard requires,
///    drops one it cannot parse, and otherwise dates the file by the clock;
///  - each file becomes an embedded file stream (ISO 32000-1 §7.11.4) with
///    its size and MD5 checksum in /Params, referred to by a file
///    specification (§7.11.3) listed in the catalog's /Names /EmbeddedFiles
///    name tree (§7.7.4) and in the catalog's /AF array with relationship
///    /Data (ISO 32000-2 §14.13: associated files holding the data a page shows);
///  - each page's trim and bleed, when it has them, become /TrimBox and
///    /BleedBox rectangles (§14.11.2) in the page dictionary;
///  - each link becomes a /Link annotation (§12.5.6.5) with a URI action
///    (§12.6.4.7) and no border, in the page's /Annots array.
///  - page labels become the catalog's /PageLabels number tree (§12.4.2);
///  - the document's language (a BCP 47 tag) becomes the catalog's /Lang
///    (§14.9.2): Cairo 1.16 has no call for it.
/// Nothing added depends on the clock, so the same page still gives the
/// same bytes.
#include <cstdio>
#include <optional>
#include <ostream>
#include <string>
#include <vector>

#include "paint/display_list.h"
#include "paint/attachment_spool.h"
#include "paint/painter.h"
#include "paint/temp_spool.h"

namespace forme {

/// Links and print boxes for one page: the page's height (to turn y-down
/// points into PDF user space), its link areas, and where it is trimmed.
struct PageLinks {
  double height = 0;
  std::vector<LinkArea> links;
  std::optional<Rect> trim_box, bleed_box;  ///< written as /TrimBox and /BleedBox (ISO 32000-1 §14.11.2)
};

/// Reads the PDF Cairo wrote to `cairo_pdf` (read from its start, left
/// open) and writes it to `out` dated `date` (a PDF date string such as
/// `D:20240229120000Z`), with `files` embedded, `pages[i]`'s links on page i, and
/// the k-th string of `figure_alts` as the alternate text (/Alt, ISO 32000-1 §14.9.3) of
/// the k-th /Figure structure element in document order (Cairo 1.16
/// writes structure tags without attributes), and `language` (empty: none)
/// as the catalog's /Lang. Objects are read from the
/// file one at a time as they are needed and the result goes straight to
/// `out`, so a long report is never held in memory whole. Throws
/// std::runtime_error if the file cannot be read or written.
void write_pdf_with_extras(std::FILE* cairo_pdf, const std::string& date, const AttachmentSpool& files,
                           const std::vector<PageLinks>& pages, TextSpool& figure_alts,
                           const std::vector<PageLabelRange>& labels, const std::string& language,
                           std::ostream& out);

}  // namespace forme
