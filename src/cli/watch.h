#pragma once
/// Live preview: `forme watch PAGE.yaml -o OUT.pdf` renders, then renders
/// again whenever the description or any file it reads changes, printing
/// each run's errors and warnings without stopping. It runs until
/// interrupted (SIGINT or SIGTERM), which also removes any half-written
/// output (cli/signal_cleanup.h).
///
/// Changes are seen through inotify on the folders holding the watched
/// files, since editors often save by writing a new file and renaming it
/// over the old one (the old file's own watch would then go quiet). Events
/// arriving together are taken as one change: the render starts once the
/// folder has been quiet for a short while.
#include <string>
#include <vector>

#include "cli/render_job.h"

namespace forme {

/// The files a render of `path` reads: the description, the page files a
/// report names, and every table file whose name is known without
/// placeholders. Files that cannot be read yet are still listed (creating
/// them is a change). Never throws.
std::vector<std::string> files_read_by(const std::string& path, const Limits& limits = {});

/// Renders `options` now and after every change, forever. Returns only if
/// inotify cannot be used (exit code 1, with a message on stderr).
int watch_and_render(RenderOptions options);

}  // namespace forme
