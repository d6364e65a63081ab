#include "paint/pdf_extras.h"

#include "paint/pdf_update.h"  // first: it sets qpdf's pointer mode

#include <qpdf/Buffer.hh>
#include <qpdf/QPDF.hh>
#include <qpdf/QPDFEFStreamObjectHelper.hh>
#include <qpdf/QPDFEmbeddedFileDocumentHelper.hh>
#include <qpdf/QPDFExc.hh>
#include <qpdf/QPDFFileSpecObjectHelper.hh>
#include <qpdf/QPDFPageDocumentHelper.hh>
#include <qpdf/QPDFXRefEntry.hh>

#include <algorithm>
#include <cctype>
#include <cstdio>
#include <map>
#include <set>
#include <stdexcept>
#include <string>
#include <string_view>
#include <vector>

namespace forme {

namespace {

// The existing objects an edit changes, to be written again.
using Changed = std::set<QPDFObjGen>;

void mark(Changed& changed, QPDFObjectHandle o) {
  if (o.isIndirect()) changed.insert(o.getObjGen());
}

void embed(QPDF& q, const std::vector<EmbeddedFile>& files, Changed& changed) {
  QPDFEmbeddedFileDocumentHelper tree(q);
  auto associated = QPDFObjectHandle::newArray();
  for (const auto& f : files) {
    // createEFStream stores /Params /Size and /CheckSum; no dates, so the
    // bytes depend on the data alone.
    auto stream = QPDFEFStreamObjectHelper::createEFStream(q, f.bytes);
    if (!f.mime_type.empty()) stream.setSubtype(f.mime_type);
    auto spec = QPDFFileSpecObjectHelper::createFileSpec(q, f.name, stream);
    if (!f.description.empty()) spec.setDescription(f.description);
    spec.getObjectHandle().replaceKey("/AFRelationship", QPDFObjectHandle::newName("/Data"));
    tree.replaceEmbeddedFile(f.name, spec);
    associated.appendItem(spec.getObjectHandle());
  }
  q.getRoot().replaceKey("/AF", associated);
  mark(changed, q.getRoot());
  QPDFObjectHandle names = q.getRoot().getKey("/Names");
  mark(changed, names);
  if (names.isDictionary()) mark(changed, names.getKey("/EmbeddedFiles"));
}

// A page's links as /Link annotations with URI actions.
void add_links(QPDF& q, QPDFObjectHandle page, const PageLinks& links, Changed& changed) {
  if (links.links.empty()) return;
  QPDFObjectHandle annots = page.getKey("/Annots");
  if (!annots.isArray()) {
    annots = QPDFObjectHandle::newArray();
    page.replaceKey("/Annots", annots);
  }
  mark(changed, page);
  mark(changed, annots);
  const double h = links.height;
  for (const auto& l : links.links) {
    auto action = QPDFObjectHandle::newDictionary();
    action.replaceKey("/S", QPDFObjectHandle::newName("/URI"));
    action.replaceKey("/URI", QPDFObjectHandle::newString(l.uri));
    auto a = QPDFObjectHandle::newDictionary();
    a.replaceKey("/Type", QPDFObjectHandle::newName("/Annot"));
    a.replaceKey("/Subtype", QPDFObjectHandle::newName("/Link"));
    // User space has y up from the page's foot (ISO 32000-1 §8.3.2.3).
    a.replaceKey("/Rect", QPDFObjectHandle::newArray(QPDFObjectHandle::Rectangle(
                              l.area.left(), h - l.area.bottom(), l.area.right(), h - l.area.top())));
    a.replaceKey("/Border", QPDFObjectHandle::parse("[0 0 0]"));  // §12.5.2: no visible border
    a.replaceKey("/A", action);
    annots.appendItem(q.makeIndirectObject(a));
  }
}

// A page's print boxes, in user space, y up from the page's foot (ISO
// 32000-1 §8.3.2.3).
void set_boxes(QPDFObjectHandle page, const PageLinks& p, Changed& changed) {
  if (!p.trim_box && !p.bleed_box) return;
  const double h = p.height;
  auto box = [h](const Rect& r) {
    return QPDFObjectHandle::newArray(QPDFObjectHandle::Rectangle(r.left(), h - r.bottom(), r.right(), h - r.top()));
  };
  if (p.trim_box) page.replaceKey("/TrimBox", box(*p.trim_box));
  if (p.bleed_box) page.replaceKey("/BleedBox", box(*p.bleed_box));
  mark(changed, page);
}

// Links and print boxes, page by page. The pages are read only when some
// page has either: reading every page costs memory in a long report.
void edit_pages(QPDF& q, const std::vector<PageLinks>& pages, Changed& changed) {
  const bool any = std::any_of(pages.begin(), pages.end(),
                               [](const PageLinks& p) { return !p.links.empty() || p.trim_box || p.bleed_box; });
  if (!any) return;
  auto all = QPDFPageDocumentHelper(q).getAllPages();
  for (std::size_t i = 0; i < pages.size() && i < all.size(); ++i) {
    QPDFObjectHandle page = all[i].getObjectHandle();
    add_links(q, page, pages[i], changed);
    set_boxes(page, pages[i], changed);
  }
}

// The text of indirect object `id`, from "N G obj" to "endobj", read from
// the file at its cross-reference offset; empty if it cannot be found.
std::string object_text(std::FILE* file, const std::map<QPDFObjGen, QPDFXRefEntry>& xref, QPDFObjGen id) {
  const auto entry = xref.find(id);
  if (entry == xref.end() || entry->second.getType() != 1) return {};
  if (std::fseek(file, static_cast<long>(entry->second.getOffset()), SEEK_SET) != 0) return {};
  std::string text;
  char block[4096];
  while (text.size() < (1u << 20)) {
    const std::size_t n = std::fread(block, 1, sizeof block, file);
    if (n == 0) return {};
    text.append(block, n);
    if (const std::size_t end = text.find("endobj"); end != std::string::npos) {
      text.resize(end + 6);
      return text;
    }
  }
  return {};
}

bool is_delimiter(char c) {
  return std::isspace(static_cast<unsigned char>(c)) || std::string_view("()<>[]{}/%").find(c) != std::string_view::npos;
}

// Whether a structure element's text names its type /Figure (the /S key).
bool is_figure_element(const std::string& text) {
  for (std::size_t at = text.find("/S"); at != std::string::npos; at = text.find("/S", at + 2)) {
    std::size_t i = at + 2;
    if (i >= text.size() || !is_delimiter(text[i])) continue;  // /Subtype, /StructParents…
    while (i < text.size() && std::isspace(static_cast<unsigned char>(text[i]))) ++i;
    const std::string_view figure = "/Figure";
    return text.compare(i, figure.size(), figure) == 0 &&
           (i + figure.size() >= text.size() || is_delimiter(text[i + figure.size()]));
  }
  return false;
}

// Cairo writes the structure tree as a Document element whose children are
// the elements of every page in drawing order, each a small dictionary.
// Thousands of them read through qpdf would cost over a kilobyte each in
// its object cache, so the children are read as text: each /Figure gets its
// /Alt added just inside its "<<", the k-th figure the k-th text.
std::map<QPDFObjGen, std::string> figures_with_alts(QPDF& q, std::FILE* file, const std::vector<std::string>& alts) {
  std::map<QPDFObjGen, std::string> out;
  // Down through the grouping elements to the list of page elements.
  QPDFObjectHandle node = q.getRoot().getKey("/StructTreeRoot").getKey("/K");
  for (int depth = 0; depth < 8; ++depth) {
    if (node.isArray() && node.getArrayNItems() == 1) node = node.getArrayItem(0);
    QPDFObjectHandle type = node.isDictionary() ? node.getKey("/S") : QPDFObjectHandle::newNull();
    if (!type.isName() || (type.getName() != "/Document" && type.getName() != "/Part" && type.getName() != "/Sect"))
      break;
    node = node.getKey("/K");
  }
  std::vector<QPDFObjectHandle> kids;
  if (node.isArray()) kids = node.getArrayAsVector();
  else kids.push_back(node);
  const auto xref = q.getXRefTable();
  std::size_t next = 0;
  for (std::size_t i = 0; i < kids.size() && next < alts.size(); ++i) {
    QPDFObjectHandle kid = kids[i];
    if (!kid.isIndirect()) continue;
    std::string text = object_text(file, xref, kid.getObjGen());
    const std::size_t open = text.find("<<");
    if (open == std::string::npos || !is_figure_element(text)) continue;
    text.insert(open + 2, " /Alt " + QPDFObjectHandle::newUnicodeString(alts[next++]).unparse());
    out.emplace(kid.getObjGen(), text + "\n");
  }
  return out;
}

// A flat number tree (ISO 32000-1 §7.9.7) of page label dictionaries
// (§12.4.2): /S /D decimal or /S /r lower-case roman, /St the first number.
void label(QPDF& q, const std::vector<PageLabelRange>& labels, Changed& changed) {
  auto nums = QPDFObjectHandle::newArray();
  for (const auto& r : labels) {
    auto d = QPDFObjectHandle::newDictionary();
    d.replaceKey("/S", QPDFObjectHandle::newName(r.style == PageNumberStyle::lower_roman ? "/r" : "/D"));
    if (r.start != 1) d.replaceKey("/St", QPDFObjectHandle::newInteger(r.start));
    nums.appendItem(QPDFObjectHandle::newInteger(static_cast<long long>(r.first_page)));
    nums.appendItem(d);
  }
  auto tree = QPDFObjectHandle::newDictionary();
  tree.replaceKey("/Nums", nums);
  // Direct in the catalog: making an indirect object has qpdf read every
  // object in the file first, which for a long report costs more memory
  // than the whole rest of the run.
  q.getRoot().replaceKey("/PageLabels", tree);
  mark(changed, q.getRoot());
}

}  // namespace

void write_pdf_with_extras(std::FILE* cairo_pdf, const std::string& date, const std::vector<EmbeddedFile>& files,
                           const std::vector<PageLinks>& pages, const std::vector<std::string>& figure_alts,
                           const std::vector<PageLabelRange>& labels, std::ostream& out) {
  try {
    QPDF q;
    q.setSuppressWarnings(true);
    std::rewind(cairo_pdf);
    q.processFile("forme output", cairo_pdf, false);
    Changed changed;
    QPDFObjectHandle info = q.getTrailer().getKey("/Info");
    if (!info.isDictionary()) {
      info = q.makeIndirectObject(QPDFObjectHandle::newDictionary());
      q.getTrailer().replaceKey("/Info", info);
    }
    info.replaceKey("/CreationDate", QPDFObjectHandle::newString(date));
    mark(changed, info);
    if (!files.empty()) embed(q, files, changed);
    edit_pages(q, pages, changed);
    std::map<QPDFObjGen, std::string> rewritten;
    if (!figure_alts.empty()) rewritten = figures_with_alts(q, cairo_pdf, figure_alts);
    if (!labels.empty()) label(q, labels, changed);
    write_incremental_update(q, cairo_pdf, changed, rewritten, out);
  } catch (const std::exception& e) {
    throw std::runtime_error(std::string("PDF date, attachments and links: ") + e.what());
  }
}

}  // namespace forme
