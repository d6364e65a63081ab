#pragma once
/// Diagnostics: every problem forme reports is a value with a location.
///
/// Stages either throw `InputError` for the first problem that stops the
/// page (one error path, caught once in the driver) or collect warnings in
/// a `DiagnosticSink`. Both print as `file:line:col: severity: message`,
/// the way compilers do, so editors can jump to the spot.
#include <stdexcept>
#include <string>
#include <vector>

namespace forme {

/// A place in an input file. line and col are 1-based; 0 means "unknown".
struct SourceLoc {
  std::string file;
  int line = 0;
  int col = 0;
};

enum class Severity { error, warning, note };

struct Diagnostic {
  Severity severity = Severity::error;
  SourceLoc loc;
  std::string message;
  std::string hint;  ///< optional second line, e.g. "did you mean 'margins'?"
};

/// Formats `file:line:col: error: message` and, when present, a
/// `  hint: ...` line. Parts of the location that are unknown are omitted.
std::string format_diagnostic(const Diagnostic& d);

/// The one exception type stages throw for input that stops the page.
class InputError : public std::runtime_error {
 public:
  explicit InputError(Diagnostic d);
  InputError(SourceLoc loc, std::string message, std::string hint = {});
  const Diagnostic& diagnostic() const { return diag_; }

 private:
  Diagnostic diag_;
};

/// Collects warnings (and notes) while stages run.
class DiagnosticSink {
 public:
  void report(Diagnostic d) { items_.push_back(std::move(d)); }
  void warn(SourceLoc loc, std::string message, std::string hint = {});
  const std::vector<Diagnostic>& items() const { return items_; }
  bool has_errors() const;

 private:
  std::vector<Diagnostic> items_;
};

}  // namespace forme
