#include "paint/pdf_extras.h"

#include <algorithm>
#include <cstdio>
#include <map>
#include <optional>
#include <stdexcept>
#include <string>
#include <string_view>
#include <vector>

#include "paint/pdf_file_reader.h"
#include "paint/pdf_syntax.h"
#include "paint/pdf_update.h"

namespace forme {

namespace {

using pdf::dict_value;
using pdf::dict_with;

// The object a value refers to, or nullopt when it is direct.
std::optional<int> ref(std::optional<std::string_view> value) {
  return value ? pdf::reference(*value) : std::nullopt;
}

// The catalog (§7.7.2), read once and written once at the end.
struct Catalog {
  int number = 0;
  std::string text;
};

// Each file becomes an embedded file stream with its size and checksum,
// referred to by a file specification listed in the catalog's name tree
// and its /AF array. No dates: the bytes depend on the data alone.
void embed(const pdf::FileReader& file, pdf::Update& update, Catalog& catalog, const AttachmentSpool& files) {
  std::map<std::string, int> by_name;  // a name tree's keys are sorted (§7.9.6); a repeated name keeps its last file
  std::string associated = "[";
  for (const SpooledFile& f : files.files()) {
    std::string entries = "/Type /EmbeddedFile";
    if (!f.mime_type.empty()) entries += " /Subtype " + pdf::name(f.mime_type);
    entries += " /Params << /Size " + std::to_string(f.size) + " /CheckSum <" + f.md5 + "> >>";
    const int stream = update.add_spooled_stream(entries, files.file(), f.offset, f.length);
    const std::string ef = std::to_string(stream) + " 0 R";
    std::string spec = "<< /Type /Filespec /F " + pdf::byte_string(f.name) + " /UF " + pdf::text_string(f.name) +
                       " /EF << /F " + ef + " /UF " + ef + " >> /AFRelationship /Data";
    if (!f.description.empty()) spec += " /Desc " + pdf::text_string(f.description);
    const int number = update.add(spec + " >>");
    by_name[f.name] = number;
    associated += " " + std::to_string(number) + " 0 R";
  }
  std::string names = "[";
  for (const auto& [n, number] : by_name) names += " " + pdf::text_string(n) + " " + std::to_string(number) + " 0 R";
  const std::string tree = "<< /Names " + names + " ] >>";
  catalog.text = dict_with(catalog.text, "/AF", associated + " ]");
  const auto names_dict = dict_value(catalog.text, "/Names");
  if (!names_dict) catalog.text = dict_with(catalog.text, "/Names", "<< /EmbeddedFiles " + tree + " >>");
  else if (auto r = pdf::reference(*names_dict)) update.replace(*r, dict_with(file.object(*r), "/EmbeddedFiles", tree));
  else catalog.text = dict_with(catalog.text, "/Names", dict_with(*names_dict, "/EmbeddedFiles", tree));
}

// The page objects in page order, down the page tree (§7.7.3.2).
void collect_pages(const pdf::FileReader& file, int node, int depth, std::vector<int>& pages) {
  if (depth > 32) throw std::runtime_error("PDF file: the page tree is too deep");
  const std::string text = file.object(node);
  const auto type = dict_value(text, "/Type");
  if (type && pdf::is_name(*type, "/Page")) {
    pages.push_back(node);
    return;
  }
  const auto kids = dict_value(text, "/Kids");
  if (!kids) return;
  for (std::string_view kid : pdf::array_items(*kids))
    if (auto r = pdf::reference(kid)) collect_pages(file, *r, depth + 1, pages);
}

// A rectangle in user space, y up from the page's foot (§8.3.2.3), from
// one in page coordinates, y down.
std::string user_rect(const Rect& r, double page_height) {
  return "[ " + pdf::number(r.left()) + " " + pdf::number(page_height - r.bottom()) + " " + pdf::number(r.right()) +
         " " + pdf::number(page_height - r.top()) + " ]";
}

// A page's links as /Link annotations (§12.5.6.5) with URI actions
// (§12.6.4.7) and no border (§12.5.2), and its print boxes (§14.11.2).
std::string edit_page(std::string page, pdf::Update& update, const pdf::FileReader& file, const PageLinks& p) {
  if (p.trim_box) page = dict_with(page, "/TrimBox", user_rect(*p.trim_box, p.height));
  if (p.bleed_box) page = dict_with(page, "/BleedBox", user_rect(*p.bleed_box, p.height));
  if (p.links.empty()) return page;
  std::string added;
  for (const auto& l : p.links)
    added += " " + std::to_string(update.add("<< /Type /Annot /Subtype /Link /Rect " + user_rect(l.area, p.height) +
                                             " /Border [ 0 0 0 ] /A << /S /URI /URI " + pdf::byte_string(l.uri) +
                                             " >> >>")) +
             " 0 R";
  const auto annots = dict_value(page, "/Annots");
  if (auto r = ref(annots)) {  // an array object of its own: extend it there
    const std::string old = file.object(*r);
    const std::size_t close = old.rfind(']');
    if (close == std::string::npos) throw std::runtime_error("PDF file: a page's /Annots is not an array");
    update.replace(*r, old.substr(0, close) + added + " ]");
    return page;
  }
  std::string list = "[";
  if (annots)
    for (std::string_view a : pdf::array_items(*annots)) list += " " + std::string(a);
  return dict_with(page, "/Annots", list + added + " ]");
}

// Links and print boxes, page by page. The page tree is read only when some
// page has either.
void edit_pages(const pdf::FileReader& file, pdf::Update& update, const Catalog& catalog,
                const std::vector<PageLinks>& pages) {
  const bool any = std::any_of(pages.begin(), pages.end(),
                               [](const PageLinks& p) { return !p.links.empty() || p.trim_box || p.bleed_box; });
  if (!any) return;
  const auto root = ref(dict_value(catalog.text, "/Pages"));
  if (!root) throw std::runtime_error("PDF file: the catalog has no page tree");
  std::vector<int> numbers;
  collect_pages(file, *root, 0, numbers);
  for (std::size_t i = 0; i < pages.size() && i < numbers.size(); ++i) {
    const PageLinks& p = pages[i];
    if (p.links.empty() && !p.trim_box && !p.bleed_box) continue;
    update.replace(numbers[i], edit_page(file.object(numbers[i]), update, file, p));
  }
}

// Whether a structure element names its type /Figure (its /S key).
bool is_figure(std::string_view element) {
  const auto s = dict_value(element, "/S");
  return s && pdf::is_name(*s, "/Figure");
}

// The value `value` stands for: the object it refers to, or itself.
std::string resolve(const pdf::FileReader& file, std::string_view value) {
  if (auto r = pdf::reference(value)) return file.object(*r);
  return std::string(value);
}

// Cairo writes the structure tree as a Document element whose children are
// the elements of every page in drawing order. Each /Figure gets its /Alt
// (§14.9.3), the k-th figure the k-th text. Elements are read one by one
// from the file, so a long report's thousands of them are never all held.
void add_figure_alts(const pdf::FileReader& file, pdf::Update& update, const Catalog& catalog, TextSpool& alts) {
  const auto root = dict_value(catalog.text, "/StructTreeRoot");
  if (!root) return;
  std::string node = resolve(file, *root);
  std::string kids_text = std::string(dict_value(node, "/K").value_or(""));
  // Down through the grouping elements to the list of page elements.
  for (int depth = 0; depth < 8; ++depth) {
    auto items = pdf::array_items(kids_text);
    if (items.size() != 1) break;
    node = resolve(file, items[0]);
    const auto type = dict_value(node, "/S");
    if (!type || !(pdf::is_name(*type, "/Document") || pdf::is_name(*type, "/Part") || pdf::is_name(*type, "/Sect")))
      break;
    kids_text = std::string(dict_value(node, "/K").value_or(""));
  }
  alts.rewind();
  std::size_t next = 0;
  for (std::string_view kid : pdf::array_items(kids_text)) {
    if (next == alts.size()) break;
    const auto number = pdf::reference(kid);
    if (!number) continue;
    const std::string element = file.object(*number);
    if (!is_figure(element)) continue;
    update.replace(*number, dict_with(element, "/Alt", pdf::text_string(alts.next())));
    ++next;
  }
}

// A flat number tree (§7.9.7) of page label dictionaries (§12.4.2): /S /D
// decimal or /S /r lower-case roman, /St the first number.
std::string label_tree(const std::vector<PageLabelRange>& labels) {
  std::string nums = "[";
  for (const auto& r : labels) {
    nums += " " + std::to_string(r.first_page) + " << /S " + (r.style == PageNumberStyle::lower_roman ? "/r" : "/D");
    if (r.start != 1) nums += " /St " + std::to_string(r.start);
    nums += " >>";
  }
  return "<< /Nums " + nums + " ] >>";
}

}  // namespace

void write_pdf_with_extras(std::FILE* cairo_pdf, const std::string& date, const AttachmentSpool& files,
                           const std::vector<PageLinks>& pages, TextSpool& figure_alts,
                           const std::vector<PageLabelRange>& labels, const std::string& language,
                           std::ostream& out) {
  try {
    const pdf::FileReader file(cairo_pdf);
    pdf::Update update(file);

    const auto info = ref(dict_value(file.trailer(), "/Info"));
    if (info) update.replace(*info, dict_with(file.object(*info), "/CreationDate", pdf::byte_string(date)));
    else update.trailer = dict_with(update.trailer, "/Info", std::to_string(update.add("<< /CreationDate " + pdf::byte_string(date) + " >>")) + " 0 R");

    Catalog catalog;
    const auto root = ref(dict_value(file.trailer(), "/Root"));
    if (!root) throw std::runtime_error("PDF file: the trailer has no catalog");
    catalog.number = *root;
    catalog.text = file.object(*root);
    const std::string original_catalog = catalog.text;

    if (!files.files().empty()) embed(file, update, catalog, files);
    edit_pages(file, update, catalog, pages);
    if (figure_alts.size() > 0) add_figure_alts(file, update, catalog, figure_alts);
    if (!labels.empty()) catalog.text = dict_with(catalog.text, "/PageLabels", label_tree(labels));
    // The natural language of the document's text (§14.9.2.1), a BCP 47
    // tag as a text string; readers and screen readers pick it up here.
    if (!language.empty()) catalog.text = dict_with(catalog.text, "/Lang", pdf::text_string(language));
    if (catalog.text != original_catalog) update.replace(catalog.number, catalog.text);

    update.write(cairo_pdf, out);
  } catch (const std::exception& e) {
    throw std::runtime_error(std::string("PDF date, attachments and links: ") + e.what());
  }
}

}  // namespace forme
