#pragma once
/// Sets the creation date of a finished PDF.
///
/// Cairo 1.16 writes a date passed through its metadata call without the
/// `D:` prefix that ISO 32000-1 §7.9.4 requires, and drops a date it cannot
/// parse; left alone it writes the time of painting. So forme rewrites the
/// `/CreationDate` string of the document information dictionary in the
/// finished bytes and shifts every cross-reference offset behind the edit
/// (ISO 32000-1 §7.5.4: each entry is a 10-digit byte offset), plus the
/// `startxref` value (§7.5.5).
///
/// The rewrite understands the file layout Cairo writes: one classic
/// cross-reference table, no incremental updates, no cross-reference
/// streams. Anything else is refused with std::runtime_error rather than
/// patched blindly.
#include <string>
#include <string_view>

namespace forme {

/// Returns `pdf` with the information dictionary's /CreationDate set to
/// `date` (a PDF date string such as `D:20240229120000Z`, written as a
/// literal string), adding the entry when it is missing.
std::string set_pdf_creation_date(std::string pdf, std::string_view date);

}  // namespace forme
