#include "base/diagnostic.h"

namespace forme {

namespace {
const char* severity_word(Severity s) {
  switch (s) {
    case Severity::error: return "error";
    case Severity::warning: return "warning";
    case Severity::note: return "note";
  }
  return "error";
}
}  // namespace

std::string format_diagnostic(const Diagnostic& d) {
  std::string out;
  if (!d.loc.file.empty()) {
    out += d.loc.file;
    if (d.loc.line > 0) {
      out += ':' + std::to_string(d.loc.line);
      if (d.loc.col > 0) out += ':' + std::to_string(d.loc.col);
    }
    out += ": ";
  }
  out += severity_word(d.severity);
  out += ": ";
  out += d.message;
  if (!d.hint.empty()) out += "\n  hint: " + d.hint;
  return out;
}

InputError::InputError(Diagnostic d)
    : std::runtime_error(format_diagnostic(d)), diag_(std::move(d)) {}

InputError::InputError(SourceLoc loc, std::string message, std::string hint)
    : InputError(Diagnostic{Severity::error, std::move(loc), std::move(message), std::move(hint)}) {}

void DiagnosticSink::warn(SourceLoc loc, std::string message, std::string hint) {
  items_.push_back({Severity::warning, std::move(loc), std::move(message), std::move(hint)});
}

bool DiagnosticSink::has_errors() const {
  for (const auto& d : items_)
    if (d.severity == Severity::error) return true;
  return false;
}

}  // namespace forme
