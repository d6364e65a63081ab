#include "report/read_report.h"

#include <filesystem>

#include "describe/schema.h"
#include "describe/validate.h"
#include "report/placeholders.h"
#include "text/language.h"

namespace forme {

bool is_report_description(const std::string& path) {
  try {
    YamlDocument doc = load_yaml_file(path);
    return doc.root.IsMap() && doc.root["sections"];
  } catch (const std::exception&) {
    return false;
  }
}

std::set<std::string> placeholder_names(const ReportPageEntry& entry) {
  std::set<std::string> names{"section"};
  if (entry.repeat) names.insert(entry.repeat->column.value);
  return names;
}

namespace {

class ReportBuilder {
 public:
  ReportBuilder(const YamlDocument& doc, std::vector<Diagnostic>& errors, const Limits& limits)
      : doc_(doc), errors_(errors), limits_(limits) {}

  ReportSpec build() {
    const YAML::Node& r = doc_.root;
    ReportSpec s;
    s.file = doc_.file;
    const std::filesystem::path base = std::filesystem::path(doc_.file).parent_path();
    s.base_dir = base.empty() ? "." : base.string();
    s.title = r["title"].Scalar();
    if (r["running-head"]) s.running_head = located(r["running-head"]);
    if (r["running-foot"]) s.running_foot = located(r["running-foot"]);
    for (const char* key : {"running-head", "running-foot"})
      if (r[key]) check_placeholders(doc_, r[key], {"section"}, errors_);
    if (auto c = r["cover"]) {
      s.cover = true;
      if (c["title"]) s.cover_title = c["title"].Scalar();
      if (auto lines = c["lines"])
        for (const auto& l : lines) s.cover_lines.push_back(l.Scalar());
    }
    if (r["contents"]) s.contents = r["contents"].Scalar() == "true";
    if (r["contents-title"]) s.contents_title = r["contents-title"].Scalar();
    if (auto d = r["document"]) {
      if (d["author"]) s.document.author = d["author"].Scalar();
      if (d["subject"]) s.document.subject = d["subject"].Scalar();
      if (auto k = d["keywords"])
        for (const auto& w : k) s.document.keywords.push_back(w.Scalar());
    }
    if (auto l = r["language"]) {
      s.language = located(l);
      // The same rule as a page's language (RFC 5646 §2.1 shape).
      if (const std::string why = language_tag_problem(s.language.value); !why.empty())
        errors_.push_back({Severity::error, s.language.loc, "'" + s.language.value + "' is not a language tag: " + why,
                           "write a BCP 47 tag: a language, then optionally a script and a region, e.g. en-GB, he, ar-EG, sr-Latn"});
    }
    for (const auto& sec : r["sections"]) s.sections.push_back(section(sec, s.base_dir));
    std::size_t entries = 0;
    for (const auto& sec : s.sections) entries += sec.pages.size();
    if (entries == 0) throw InputError(doc_.loc(r["sections"]), "the report has no pages", "list pages under a section's 'pages'");
    return s;
  }

 private:
  Located located(const YAML::Node& n) const { return {n.Scalar(), doc_.loc(n)}; }

  ReportSection section(const YAML::Node& n, const std::string& base) {
    ReportSection sec;
    sec.loc = doc_.loc(n);
    sec.title = n["title"].Scalar();
    check_placeholders(doc_, n["title"], {}, errors_);
    for (const auto& e : n["pages"]) sec.pages.push_back(entry(e, base));
    return sec;
  }

  ReportPageEntry entry(const YAML::Node& n, const std::string& base) {
    ReportPageEntry e;
    e.loc = doc_.loc(n);
    const YAML::Node page = n["page"];
    if (page.IsScalar()) {
      e.page = page_file(page, base);
    } else {
      e.page = YamlDocument{doc_.file, doc_.text, page};  // validated with the report
    }
    const bool page_valid = page.IsMap() || validate_page(e.page);
    if (n["title"]) e.title = located(n["title"]);
    if (auto rp = n["one-page-per"]) {
      RepeatSpec r;
      r.loc = doc_.loc(rp);
      r.table = located(rp["table"]);
      r.column = located(rp["column"]);
      if (auto o = rp["order"]) {
        if (o.IsScalar()) {
          r.order = o.Scalar() == "sorted" ? RepeatSpec::Order::sorted : RepeatSpec::Order::as_read;
        } else {
          r.order = RepeatSpec::Order::listed;
          for (const auto& v : o) r.listed.push_back(located(v));
        }
      }
      e.repeat = r;
      if (page_valid) check_repeat_table(e);
    }
    const auto names = placeholder_names(e);
    if (n["title"]) check_placeholders(doc_, n["title"], names, errors_);
    if (page_valid) check_placeholders(e.page, e.page.root, names, errors_);
    return e;
  }

  YamlDocument page_file(const YAML::Node& n, const std::string& base) {
    const std::filesystem::path p(n.Scalar());
    // A report in the current folder names its pages as written.
    const std::string path =
        p.is_absolute() || base == "." ? p.string() : (std::filesystem::path(base) / p).string();
    try {
      return load_yaml_file(path, limits_);
    } catch (const InputError& e) {
      // A file that cannot be opened is best reported where the report names it.
      if (e.diagnostic().loc.line != 0) throw;
      Diagnostic d = e.diagnostic();
      d.message = "page '" + n.Scalar() + "': " + d.message;
      d.loc = doc_.loc(n);
      throw InputError(d);
    }
  }

  bool validate_page(const YamlDocument& page) {
    auto found = validate_document(page, page_schema());
    errors_.insert(errors_.end(), found.begin(), found.end());
    return found.empty();
  }

  // The repeat table must be one the page reads, from one file for all pages.
  void check_repeat_table(const ReportPageEntry& e) {
    const RepeatSpec& r = *e.repeat;
    const YAML::Node tables = e.page.root["tables"];
    const YAML::Node t = tables[r.table.value];
    if (!t) {
      std::string names;
      for (auto it = tables.begin(); it != tables.end(); ++it)
        names += (names.empty() ? "" : ", ") + it->first.Scalar();
      errors_.push_back({Severity::error, r.table.loc, "the page has no table '" + r.table.value + "'",
                         "its tables are: " + names});
      return;
    }
    if (has_placeholders(t))
      errors_.push_back({Severity::error, e.page.loc(t),
                         "the table a page is repeated for cannot name its file with a placeholder",
                         "its values decide the pages; name one file for all of them"});
  }

  const YamlDocument& doc_;
  std::vector<Diagnostic>& errors_;
  const Limits& limits_;
};

}  // namespace

std::optional<ReportSpec> read_report(const std::string& path, std::vector<Diagnostic>& errors, const Limits& limits) {
  YamlDocument doc = load_yaml_file(path, limits);
  errors = validate_document(doc, report_schema());
  if (!errors.empty()) return std::nullopt;
  ReportSpec spec = ReportBuilder(doc, errors, limits).build();
  if (!errors.empty()) return std::nullopt;
  return spec;
}

}  // namespace forme
