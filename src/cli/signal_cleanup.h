#pragma once
/// Removing the output's temporary file when a run is interrupted.
///
/// Output is written to a temporary file and renamed into place only when
/// complete (paint/atomic_file.h). A SIGINT or SIGTERM arriving meanwhile
/// would leave that temporary file behind; the handler installed here
/// unlinks it and then dies of the same signal with its default action, so
/// the caller still sees "killed by SIGINT".
///
/// The handler only calls async-signal-safe functions (unlink, sigaction,
/// raise) on a path stored in a static buffer.
#include <signal.h>

namespace forme {

/// Installs the SIGINT/SIGTERM handler (the command line does this once).
void install_signal_cleanup();

/// Names the temporary file to remove if a signal arrives; nullptr clears it.
/// Paths too long for the handler's buffer are not registered.
void set_cleanup_path(const char* path);

/// Blocks SIGINT and SIGTERM for its lifetime, so a temporary file can be
/// created and registered with no gap between the two.
class SignalBlock {
 public:
  SignalBlock();
  ~SignalBlock();
  SignalBlock(const SignalBlock&) = delete;
  SignalBlock& operator=(const SignalBlock&) = delete;

 private:
  sigset_t saved_;
};

}  // namespace forme
