#pragma once
/// A progress bar for long renders on a terminal: one line on stderr,
/// redrawn in place with pages done, pages per second and the time left.
/// The caller decides whether to show it (only when stderr is a terminal
/// and the user did not ask for quiet).
#include <chrono>
#include <cstddef>
#include <cstdio>
#include <string>

namespace forme {

class ProgressBar {
 public:
  explicit ProgressBar(std::FILE* out) : out_(out), start_(std::chrono::steady_clock::now()) {}
  ~ProgressBar();
  ProgressBar(const ProgressBar&) = delete;
  ProgressBar& operator=(const ProgressBar&) = delete;

  /// Records progress; redraws at most ten times a second, and at the end.
  void update(std::size_t done, std::size_t total);

  /// The line for `done` of `total` after `seconds`, without the carriage return.
  static std::string line(std::size_t done, std::size_t total, double seconds);

 private:
  std::FILE* out_;
  std::chrono::steady_clock::time_point start_, last_{};
  bool drawn_ = false;
};

/// True when stderr is a terminal.
bool stderr_is_terminal();

}  // namespace forme
