#include "support/outside_tools.h"

#include <sys/wait.h>
#include <unistd.h>

#include <algorithm>
#include <array>
#include <cstring>
#include <cstdio>
#include <cstdlib>
#include <filesystem>
#include <fstream>
#include <regex>
#include <sstream>
#include <stdexcept>

namespace forme::test {

CommandResult run(const std::string& command) {
  TempDir tmp;
  const std::string out = tmp.file("out"), err = tmp.file("err");
  const std::string full = "(" + command + ") >" + out + " 2>" + err + " </dev/null";
  int status = std::system(full.c_str());
  CommandResult r;
  r.exit_code = WIFEXITED(status) ? WEXITSTATUS(status) : -1;
  r.out = read_file(out);
  r.err = read_file(err);
  return r;
}

bool have_tool(const std::string& tool) { return run("command -v " + tool).exit_code == 0; }

TempDir::TempDir() {
  std::string pattern = (std::filesystem::temp_directory_path() / "forme-test-XXXXXX").string();
  if (!::mkdtemp(pattern.data())) throw std::runtime_error("mkdtemp failed");
  path_ = pattern;
}

TempDir::~TempDir() {
  std::error_code ec;
  std::filesystem::remove_all(path_, ec);
}

void write_file(const std::string& path, const std::string& text) {
  std::filesystem::create_directories(std::filesystem::path(path).parent_path());
  std::ofstream(path, std::ios::binary) << text;
}

std::string read_file(const std::string& path) {
  std::ifstream in(path, std::ios::binary);
  std::ostringstream ss;
  ss << in.rdbuf();
  return ss.str();
}

CommandResult run_forme(const std::string& args) { return run(std::string(FORME_BINARY) + " " + args); }

namespace {

std::string unescape(std::string s) {
  const std::pair<const char*, const char*> ents[] = {{"&lt;", "<"}, {"&gt;", ">"}, {"&quot;", "\""}, {"&#39;", "'"}, {"&apos;", "'"}, {"&amp;", "&"}};
  for (auto [from, to] : ents)
    for (std::size_t p = s.find(from); p != std::string::npos; p = s.find(from, p + 1)) s.replace(p, std::strlen(from), to);
  return s;
}

std::vector<PdfPageWords> parse_bbox(const std::string& xhtml, const std::string& element) {
  static const std::regex page_re(R"re(<page width="([0-9.]+)" height="([0-9.]+)")re");
  const std::regex item_re("<" + element + R"re( xMin="([-0-9.]+)" yMin="([-0-9.]+)" xMax="([-0-9.]+)" yMax="([-0-9.]+)">)re");
  static const std::regex word_re(R"re(<word xMin="[-0-9.]+" yMin="[-0-9.]+" xMax="[-0-9.]+" yMax="[-0-9.]+">([^<]*)</word>)re");
  std::vector<PdfPageWords> pages;
  std::istringstream in(xhtml);
  std::string line;
  PdfWord* open_line = nullptr;
  while (std::getline(in, line)) {
    std::smatch m;
    if (std::regex_search(line, m, page_re)) {
      pages.push_back({std::stod(m[1]), std::stod(m[2]), {}});
      open_line = nullptr;
      continue;
    }
    if (pages.empty()) continue;
    if (std::regex_search(line, m, item_re)) {
      PdfWord w{"", std::stod(m[1]), std::stod(m[2]), std::stod(m[3]), std::stod(m[4])};
      if (element == "word") {
        auto close = line.find("</word>");
        auto open = line.find('>', static_cast<std::size_t>(m.position(0)) + 1);
        w.text = unescape(line.substr(open + 1, close - open - 1));
        pages.back().words.push_back(w);
      } else {
        pages.back().words.push_back(w);
        open_line = &pages.back().words.back();
      }
      continue;
    }
    if (open_line && std::regex_search(line, m, word_re)) {
      if (!open_line->text.empty()) open_line->text += ' ';
      open_line->text += unescape(m[1]);
    }
    if (line.find("</line>") != std::string::npos) open_line = nullptr;
  }
  return pages;
}

}  // namespace

std::vector<PdfPageWords> pdf_words(const std::string& pdf) {
  auto r = run("pdftotext -bbox '" + pdf + "' -");
  if (r.exit_code != 0) throw std::runtime_error("pdftotext failed: " + r.err);
  return parse_bbox(r.out, "word");
}

std::map<std::string, PdfBox> pdfinfo_boxes(const std::string& pdf) {
  auto r = run("pdfinfo -box '" + pdf + "'");
  if (r.exit_code != 0) throw std::runtime_error("pdfinfo failed: " + r.err);
  std::map<std::string, PdfBox> out;
  static const std::regex re(R"re((\w+Box):\s+([-0-9.]+)\s+([-0-9.]+)\s+([-0-9.]+)\s+([-0-9.]+))re");
  for (std::sregex_iterator it(r.out.begin(), r.out.end(), re), end; it != end; ++it)
    out[(*it)[1]] = {std::stod((*it)[2]), std::stod((*it)[3]), std::stod((*it)[4]), std::stod((*it)[5])};
  return out;
}

std::vector<PdfPageWords> pdf_layout_words(const std::string& pdf) {
  auto r = run("pdftotext -bbox-layout '" + pdf + "' -");
  if (r.exit_code != 0) throw std::runtime_error("pdftotext failed: " + r.err);
  return parse_bbox(r.out, "word");
}

std::vector<PdfPageWords> pdf_lines(const std::string& pdf) {
  auto r = run("pdftotext -bbox-layout '" + pdf + "' -");
  if (r.exit_code != 0) throw std::runtime_error("pdftotext failed: " + r.err);
  return parse_bbox(r.out, "line");
}

namespace {

// A report description has a top-level `sections` key; a page made to be
// repeated by a report holds $( placeholders.
enum class YamlKind { page, report, template_page };

YamlKind kind_of(const std::string& path) {
  const std::string text = read_file(path);
  if (text.rfind("sections:", 0) == 0 || text.find("\nsections:") != std::string::npos) return YamlKind::report;
  if (text.find("$(") != std::string::npos) return YamlKind::template_page;
  return YamlKind::page;
}

std::vector<std::string> layout_files(YamlKind kind) {
  std::vector<std::string> out;
  for (const auto& e : std::filesystem::recursive_directory_iterator(std::string(FORME_SOURCE_DIR) + "/layouts"))
    if (e.path().extension() == ".yaml" && kind_of(e.path().string()) == kind) out.push_back(e.path().string());
  std::sort(out.begin(), out.end());
  return out;
}

}  // namespace

std::vector<std::string> layout_pages() { return layout_files(YamlKind::page); }

std::vector<std::string> layout_reports() { return layout_files(YamlKind::report); }

}  // namespace forme::test
