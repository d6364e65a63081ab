#include "paint/pdf_extras.h"

// qpdf 11: use std::shared_ptr only, never its older PointerHolder.
#define POINTERHOLDER_TRANSITION 4

#include <qpdf/Buffer.hh>
#include <qpdf/QPDF.hh>
#include <qpdf/QPDFEFStreamObjectHelper.hh>
#include <qpdf/QPDFEmbeddedFileDocumentHelper.hh>
#include <qpdf/QPDFExc.hh>
#include <qpdf/QPDFFileSpecObjectHelper.hh>
#include <qpdf/QPDFPageDocumentHelper.hh>
#include <qpdf/QPDFWriter.hh>

#include <stdexcept>

namespace forme {

namespace {

void embed(QPDF& q, const std::vector<EmbeddedFile>& files) {
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
}

void link(QPDF& q, const std::vector<PageLinks>& pages) {
  auto all = QPDFPageDocumentHelper(q).getAllPages();
  for (std::size_t i = 0; i < pages.size() && i < all.size(); ++i) {
    if (pages[i].links.empty()) continue;
    QPDFObjectHandle page = all[i].getObjectHandle();
    QPDFObjectHandle annots = page.getKey("/Annots");
    if (!annots.isArray()) {
      annots = QPDFObjectHandle::newArray();
      page.replaceKey("/Annots", annots);
    }
    const double h = pages[i].height;
    for (const auto& l : pages[i].links) {
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
}

// Page boxes in user space, y up from the page's foot (ISO 32000-1 §8.3.2.3).
void set_boxes(QPDF& q, const std::vector<PageLinks>& pages) {
  auto all = QPDFPageDocumentHelper(q).getAllPages();
  for (std::size_t i = 0; i < pages.size() && i < all.size(); ++i) {
    QPDFObjectHandle page = all[i].getObjectHandle();
    const double h = pages[i].height;
    auto box = [h](const Rect& r) {
      return QPDFObjectHandle::newArray(QPDFObjectHandle::Rectangle(r.left(), h - r.bottom(), r.right(), h - r.top()));
    };
    if (pages[i].trim_box) page.replaceKey("/TrimBox", box(*pages[i].trim_box));
    if (pages[i].bleed_box) page.replaceKey("/BleedBox", box(*pages[i].bleed_box));
  }
}

// Depth-first through the structure tree, in the order of its /K arrays,
// which is the reading order Cairo wrote.
void set_figure_alts(QPDFObjectHandle node, const std::vector<std::string>& alts, std::size_t& next, int depth) {
  if (depth > 64 || next >= alts.size()) return;
  if (node.isArray()) {
    for (int i = 0; i < node.getArrayNItems(); ++i) set_figure_alts(node.getArrayItem(i), alts, next, depth + 1);
    return;
  }
  if (!node.isDictionary()) return;
  QPDFObjectHandle s = node.getKey("/S");
  if (s.isName() && s.getName() == "/Figure") node.replaceKey("/Alt", QPDFObjectHandle::newUnicodeString(alts[next++]));
  set_figure_alts(node.getKey("/K"), alts, next, depth + 1);
}

// A flat number tree (ISO 32000-1 §7.9.7) of page label dictionaries
// (§12.4.2): /S /D decimal or /S /r lower-case roman, /St the first number.
void label(QPDF& q, const std::vector<PageLabelRange>& labels) {
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
  q.getRoot().replaceKey("/PageLabels", q.makeIndirectObject(tree));
}

}  // namespace

std::string add_pdf_extras(const std::string& pdf, const std::vector<EmbeddedFile>& files,
                           const std::vector<PageLinks>& pages, const std::vector<std::string>& figure_alts,
                           const std::vector<PageLabelRange>& labels) {
  bool any_link = false;
  bool any_box = false;
  for (const auto& p : pages) any_link = any_link || !p.links.empty(), any_box = any_box || p.trim_box || p.bleed_box;
  if (files.empty() && !any_link && !any_box && figure_alts.empty() && labels.empty()) return pdf;
  try {
    QPDF q;
    q.setSuppressWarnings(true);
    q.processMemoryFile("forme output", pdf.data(), pdf.size());
    if (!files.empty()) embed(q, files);
    link(q, pages);
    set_boxes(q, pages);
    if (!figure_alts.empty()) {
      std::size_t next = 0;
      QPDFObjectHandle root = q.getRoot().getKey("/StructTreeRoot");
      if (root.isDictionary()) set_figure_alts(root.getKey("/K"), figure_alts, next, 0);
    }
    if (!labels.empty()) label(q, labels);
    QPDFWriter w(q);
    w.setOutputMemory();
    w.setDeterministicID(true);       // /ID from the content, not the time
    w.setDecodeLevel(qpdf_dl_none);   // keep Cairo's streams as they are
    w.setCompressStreams(true);       // and compress the new ones
    w.write();
    auto buffer = w.getBufferSharedPointer();
    return std::string(reinterpret_cast<const char*>(buffer->getBuffer()), buffer->getSize());
  } catch (const std::exception& e) {
    throw std::runtime_error(std::string("PDF attachments and links: ") + e.what());
  }
}

}  // namespace forme
