// PDF output: vector pages, fonts embedded as subsets by Cairo.
#include <cairo-pdf.h>
#include <unistd.h>

#include <cerrno>
#include <cstdio>
#include <cstdlib>
#include <cstring>
#include <ctime>
#include <stdexcept>
#include <string>
#include <string_view>

#include "base/diagnostic.h"
#include "paint/attachment_spool.h"
#include "paint/cairo_stream.h"
#include "paint/draw_cairo.h"
#include "paint/painter.h"
#include "paint/pdf_dates.h"
#include "paint/pdf_extras.h"
#include "paint/temp_spool.h"

namespace forme {

namespace {

// A temporary file in $TMPDIR (else /tmp) that has no name: removed from
// the folder at once, it goes away when closed, even if forme is killed.
class PdfPainter final : public Painter {
 public:
  PdfPainter(std::ostream& out, const PaintOptions& options)
      : out_(out),
        options_(options),
        date_(pdf_date_utc(options.info.creation_time.value_or(static_cast<std::int64_t>(std::time(nullptr))))) {
    for (const auto& f : options.info.attachments) attachments_.add(f);
  }
  ~PdfPainter() override {
    if (cr_) cairo_destroy(cr_);
    if (surface_) cairo_surface_destroy(surface_);
    if (spool_) std::fclose(spool_);
  }

  void paint(const DisplayPage& page) override {
    if (!surface_) {
      // Cairo's file waits on disk for the finishing pass, not in memory,
      // so a long report does not hold its whole file twice.
      spool_ = anonymous_temp_file();
      surface_ = cairo_pdf_surface_create_for_stream(write_to_file, spool_, page.width, page.height);
      check_cairo(cairo_surface_status(surface_), "PDF surface");
      cairo_pdf_surface_restrict_to_version(surface_, CAIRO_PDF_VERSION_1_5);
      const std::string& title = options_.info.title.empty() ? page.title : options_.info.title;
      if (!title.empty()) cairo_pdf_surface_set_metadata(surface_, CAIRO_PDF_METADATA_TITLE, title.c_str());
      cairo_pdf_surface_set_metadata(surface_, CAIRO_PDF_METADATA_CREATOR, options_.info.creator.c_str());
      set_document_information();
      // Cairo writes this date in a form ISO 32000-1 §7.9.4 does not allow
      // (no `D:`); finish() supersedes it with a conforming one. Given here,
      // Cairo's copy is the same instant rather than the clock's, so the
      // bytes stay reproducible. "D:YYYYMMDDHHmmSSZ" -> "YYYY-MM-DDTHH:mm:SSZ".
      const std::string iso = date_.substr(2, 4) + "-" + date_.substr(6, 2) + "-" + date_.substr(8, 2) + "T" +
                              date_.substr(10, 2) + ":" + date_.substr(12, 2) + ":" + date_.substr(14, 2) + "Z";
      cairo_pdf_surface_set_metadata(surface_, CAIRO_PDF_METADATA_CREATE_DATE, iso.c_str());
      cr_ = cairo_create(surface_);
      // One structure tree for the whole file (ISO 32000-1 §14.8): the
      // chart and any table pages are one document.
      cairo_tag_begin(cr_, "Document", "");
    } else {
      cairo_pdf_surface_set_size(surface_, page.width, page.height);
    }
    links_.push_back(PageLinks{page.height, page.links, page.trim_box, page.bleed_box});
    draw_tagged(page);
    cairo_show_page(cr_);
    check_cairo(cairo_status(cr_), "PDF page");
  }

  void attach(const EmbeddedFile& file) override { attachments_.add(file); }

  void finish() override {
    if (!surface_) return;
    cairo_tag_end(cr_, "Document");
    cairo_destroy(cr_);
    cr_ = nullptr;
    add_outline();
    cairo_surface_finish(surface_);
    check_cairo(cairo_surface_status(surface_), "PDF file");
    cairo_surface_destroy(surface_);
    surface_ = nullptr;
    if (std::fflush(spool_) != 0 || std::ferror(spool_)) throw std::runtime_error("PDF file: temporary file write failed");
    write_pdf_with_extras(spool_, date_, attachments_, links_, alts_,
                          options_.info.page_labels, options_.info.language, out_);
    if (!out_) throw std::runtime_error("PDF file: write failed");
  }

 private:
  // Every item is drawn inside exactly one structure element, never
  // directly in Document: Cairo 1.16 mis-nests content that precedes a
  // child tag. The page title is H1, a panel's items one Figure, other
  // text P, and other shapes (the footer rule) a Div.
  static const char* tag_for(const DisplayItem& item) {
    if (const auto* t = std::get_if<TextItem>(&item)) return t->role == TextRole::title ? "H1" : "P";
    return "Div";
  }

  void draw_tagged(const DisplayPage& page) {
    begin_drawing(cr_);
    std::size_t i = 0, f = 0;
    while (i < page.items.size()) {
      if (f < page.figures.size() && page.figures[f].first == i && page.figures[f].end > i) {
        cairo_tag_begin(cr_, "Figure", "");
        for (; i < page.figures[f].end; ++i) draw_item(cr_, page.items[i]);
        cairo_tag_end(cr_, "Figure");
        alts_.push(page.figures[f].alt);
        ++f;
        continue;
      }
      const std::size_t stop = f < page.figures.size() ? page.figures[f].first : page.items.size();
      const char* tag = tag_for(page.items[i]);
      cairo_tag_begin(cr_, tag, "");
      // Neighbouring items of the same kind (the lines of one title or
      // note) make one element.
      do draw_item(cr_, page.items[i++]);
      while (i < stop && std::string_view(tag_for(page.items[i])) == tag &&
             !(std::get_if<TextItem>(&page.items[i]) && std::get_if<TextItem>(&page.items[i - 1]) &&
               std::get<TextItem>(page.items[i]).role != std::get<TextItem>(page.items[i - 1]).role));
      cairo_tag_end(cr_, tag);
    }
    end_drawing(cr_);
  }

  // Cairo resolves "page=N" destinations when the file is finished.
  void add_outline() {
    std::vector<int> ids;
    for (const auto& e : options_.info.outline) {
      const int parent = e.parent >= 0 && static_cast<std::size_t>(e.parent) < ids.size()
                             ? ids[static_cast<std::size_t>(e.parent)]
                             : CAIRO_PDF_OUTLINE_ROOT;
      const std::string dest = "page=" + std::to_string(e.page + 1);
      ids.push_back(cairo_pdf_surface_add_outline(surface_, parent, e.title.c_str(), dest.c_str(),
                                                  static_cast<cairo_pdf_outline_flags_t>(0)));
    }
  }

  void set_document_information() {
    const DocumentInfo& d = options_.info;
    if (!d.author.empty()) cairo_pdf_surface_set_metadata(surface_, CAIRO_PDF_METADATA_AUTHOR, d.author.c_str());
    if (!d.subject.empty()) cairo_pdf_surface_set_metadata(surface_, CAIRO_PDF_METADATA_SUBJECT, d.subject.c_str());
    std::string words;
    for (const auto& k : d.keywords) words += (words.empty() ? "" : ", ") + k;
    if (!words.empty()) cairo_pdf_surface_set_metadata(surface_, CAIRO_PDF_METADATA_KEYWORDS, words.c_str());
  }

  std::ostream& out_;
  std::vector<PageLinks> links_;  ///< each painted page's links, in page order
  AttachmentSpool attachments_;  ///< compressed, on disk until finish
  TextSpool alts_;  ///< each figure's alternate text, in document order, kept on disk until finish
  std::FILE* spool_ = nullptr;  ///< Cairo's output, finished before it reaches out_
  PaintOptions options_;
  std::string date_;  ///< the document's creation date, "D:YYYYMMDDHHmmSSZ"
  cairo_surface_t* surface_ = nullptr;
  cairo_t* cr_ = nullptr;
};

}  // namespace

std::unique_ptr<Painter> make_pdf_painter(std::ostream& out, const PaintOptions& options) {
  return std::make_unique<PdfPainter>(out, options);
}

}  // namespace forme
