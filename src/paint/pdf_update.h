#pragma once
/// Writes a finished PDF followed by an incremental update (ISO 32000-1
/// §7.5.6): the original bytes unchanged, then every object that was
/// changed or added, a cross-reference section for just those objects
/// (§7.5.4) and a trailer whose /Prev points at the original one.
///
/// This is how forme adds what Cairo cannot write (see pdf_extras.h) without
/// rewriting the whole file: the cost, in time and memory, follows what was
/// added, not the length of the document.
#include <cstdio>
#include <map>
#include <ostream>
#include <set>
#include <string>

// qpdf 11: use std::shared_ptr only, never its older PointerHolder.
#define POINTERHOLDER_TRANSITION 4
#include <qpdf/QPDF.hh>

namespace forme {

/// `q` was opened on `original` (whose bytes are copied to `out` first)
/// and then edited: `changed` names the existing indirect objects whose
/// content changed; every indirect object numbered past the original
/// trailer's /Size was added and is written too. New streams are written
/// compressed. `rewritten` holds objects edited as text, each written as
/// given (from "N G obj" to "endobj"). Throws std::runtime_error when a write fails or the original
/// does not end as a PDF file must (`startxref` and an offset).
void write_incremental_update(QPDF& q, std::FILE* original, const std::set<QPDFObjGen>& changed,
                              const std::map<QPDFObjGen, std::string>& rewritten, std::ostream& out);

}  // namespace forme
