#pragma once
/// An incremental update (ISO 32000-1 §7.5.6) to a finished PDF: the
/// original bytes unchanged, then every object that was changed or added,
/// a cross-reference section for just those objects (§7.5.4) and a trailer
/// whose /Prev points at the original one.
///
/// This is how forme adds what Cairo cannot write (see pdf_extras.h) without
/// rewriting the whole file: the cost, in time and memory, follows what was
/// added, not the length of the document.
#include <cstdio>
#include <map>
#include <ostream>
#include <string>
#include <string_view>

#include "paint/pdf_file_reader.h"

namespace forme::pdf {

class Update {
 public:
  /// An update to the file `original` reads: new objects are numbered on
  /// from its /Size.
  explicit Update(const FileReader& original)
      : trailer(original.trailer()), original_(original), next_(original.size()) {}

  /// Replaces object `number`'s text (what goes between "obj" and "endobj").
  void replace(int number, std::string text) { objects_[number] = std::move(text); }
  /// A new object; returns its number.
  int add(std::string text);
  /// A new stream whose `length` bytes, already Flate-compressed, lie at
  /// `offset` in `spool`; they are copied from there when the update is
  /// written, never held here. Returns its number.
  int add_spooled_stream(std::string_view entries, std::FILE* spool, long offset, std::size_t length);

  /// The trailer to write, edited by the caller (e.g. a new /Info); /Size
  /// and /Prev are set here.
  std::string trailer;

  /// Copies the original file (`file`, the one read) to `out`, then writes
  /// the update. Throws std::runtime_error when a read or write fails.
  void write(std::FILE* file, std::ostream& out) const;

 private:
  const FileReader& original_;
  int next_;
  struct Spooled {
    std::FILE* file;
    long offset;
    std::size_t length;
  };
  std::map<int, std::string> objects_;
  std::map<int, Spooled> spooled_;  ///< data of streams whose text in objects_ ends at "stream" 
};

}  // namespace forme::pdf
