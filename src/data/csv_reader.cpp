#include "data/csv_reader.h"

#include <fcntl.h>
#include <sys/stat.h>
#include <unistd.h>

#include <algorithm>
#include <cerrno>
#include <optional>
#include <system_error>
#include <unordered_map>
#include <utility>
#include <vector>

#include "base/diagnostic.h"
#include "data/column_types.h"
#include "data/csv_tokenizer.h"

namespace forme {

namespace {

std::string count_of(std::size_t n, const char* noun) {
  return std::to_string(n) + " " + noun + (n == 1 ? "" : "s");
}

[[noreturn]] void too_large(const std::string& display_path, unsigned long long size, std::size_t limit) {
  throw InputError(SourceLoc{display_path},
                   "data file is " + std::to_string(size) + " bytes, more than the limit of " +
                       std::to_string(limit) + " bytes");
}

[[noreturn]] void cannot_open(const std::string& display_path, int error) {
  throw InputError(SourceLoc{display_path},
                   "cannot open data file: " + std::generic_category().message(error));
}

/// Reads the header record into named, empty columns.
std::vector<Column> header_columns(const csv::Record& header, const std::string& path) {
  std::vector<Column> columns;
  columns.reserve(header.fields.size());
  std::unordered_map<std::string, std::size_t> seen;  // name -> 1-based column number
  for (const csv::Field& f : header.fields) {
    const std::size_t number = columns.size() + 1;
    std::string name(trim_blanks(f.text));
    if (name.empty())
      throw InputError(SourceLoc{path, f.line, f.col},
                       "column " + std::to_string(number) + " has an empty header name",
                       "every column needs a name in the first row");
    const auto [it, inserted] = seen.emplace(name, number);
    if (!inserted)
      throw InputError(SourceLoc{path, f.line, f.col},
                       "duplicate column name '" + quote_cell(name) + "' (first at column " +
                           std::to_string(it->second) + ")");
    Column& c = columns.emplace_back();
    c.name = std::move(name);
    c.header_col = f.col;
  }
  return columns;
}

}  // namespace

Table parse_csv(std::string_view content, const std::string& display_path, const CsvOptions& options) {
  if (content.size() > options.max_bytes) too_large(display_path, content.size(), options.max_bytes);

  csv::Tokenizer tokenizer(content, display_path);
  csv::Record record;
  if (!tokenizer.next(record)) throw InputError(SourceLoc{display_path}, "table has no header row");

  Table table;
  table.path = display_path;
  table.columns = header_columns(record, display_path);
  const std::size_t width = table.columns.size();

  std::vector<std::optional<ColumnType>> declared(width);
  for (const auto& [name, type] : options.declared) {
    const Column* column = table.find(name);
    if (!column)
      throw InputError(SourceLoc{display_path},
                       "a type is declared for column '" + quote_cell(name) + "' but the table has no such column");
    declared[static_cast<std::size_t>(column - table.columns.data())] = type;
  }

  // Each line holds at most one row: reserving once spares a million-row
  // table the copies of growing its columns step by step.
  const std::size_t most_rows = static_cast<std::size_t>(std::count(content.begin(), content.end(), '\n')) + 1;
  std::vector<std::vector<CellLoc>> locs(width);
  for (std::size_t j = 0; j < width; ++j) {
    table.columns[j].text.reserve(most_rows);
    locs[j].reserve(most_rows);
  }
  table.row_lines.reserve(most_rows);
  while (tokenizer.next(record)) {
    const std::size_t n = record.fields.size();
    if (n != width) {
      // Too many: at the first field past the header's width; too few: the row's line.
      const bool too_many = n > width;
      const SourceLoc at = too_many ? SourceLoc{display_path, record.fields[width].line, record.fields[width].col}
                                    : SourceLoc{display_path, record.line};
      throw InputError(at, "row has " + count_of(n, "field") + " but the header has " + std::to_string(width),
                       too_many ? "a field that contains a comma must be enclosed in double quotes"
                                : "write a missing value as an empty field, e.g. a,,c");
    }
    for (std::size_t j = 0; j < width; ++j) {
      csv::Field& f = record.fields[j];
      table.columns[j].text.push_back(std::move(f.text));
      locs[j].push_back(CellLoc{f.line, f.col});
    }
    table.row_lines.push_back(record.line);
    ++table.rows;
  }
  if (table.rows == 0) throw InputError(SourceLoc{display_path}, "table has no data rows");

  for (std::size_t j = 0; j < width; ++j) {
    assign_column_type(table.columns[j], declared[j], locs[j], display_path, options.missing);
    std::vector<CellLoc>().swap(locs[j]);  // free as we go
  }
  return table;
}

Table read_csv(const std::string& path, const std::string& display_path, const CsvOptions& options) {
  // Look before reading: refuse what is missing, not a file, or too large.
  struct stat st {};
  if (::stat(path.c_str(), &st) != 0) cannot_open(display_path, errno);
  if (S_ISDIR(st.st_mode)) cannot_open(display_path, EISDIR);
  if (!S_ISREG(st.st_mode))
    throw InputError(SourceLoc{display_path}, "cannot open data file: not a regular file");
  if (static_cast<unsigned long long>(st.st_size) > options.max_bytes)
    too_large(display_path, static_cast<unsigned long long>(st.st_size), options.max_bytes);

  const int fd = ::open(path.c_str(), O_RDONLY | O_CLOEXEC);
  if (fd < 0) cannot_open(display_path, errno);
  struct Closer {
    int fd;
    ~Closer() { ::close(fd); }
  } closer{fd};

  // The file may have grown since stat: read at most one byte past the limit.
  std::string content;
  content.resize(static_cast<std::size_t>(st.st_size));
  std::size_t used = 0;
  for (;;) {
    if (used == content.size()) {
      if (used > options.max_bytes) too_large(display_path, used, options.max_bytes);
      const std::size_t room = options.max_bytes - used;  // used <= max_bytes here
      content.resize(used + (room >= 65536 ? 65536 : room + 1));
    }
    const ssize_t got = ::read(fd, content.data() + used, content.size() - used);
    if (got < 0) {
      if (errno == EINTR) continue;
      throw InputError(SourceLoc{display_path},
                       "cannot read data file: " + std::generic_category().message(errno));
    }
    if (got == 0) break;
    used += static_cast<std::size_t>(got);
  }
  content.resize(used);
  if (used > options.max_bytes) too_large(display_path, used, options.max_bytes);
  return parse_csv(content, display_path, options);
}

}  // namespace forme
