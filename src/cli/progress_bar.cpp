#include "cli/progress_bar.h"

#include <unistd.h>

#include <cmath>

namespace forme {

bool stderr_is_terminal() { return ::isatty(STDERR_FILENO) == 1; }

std::string ProgressBar::line(std::size_t done, std::size_t total, double seconds) {
  constexpr int kWidth = 24;
  const double part = total == 0 ? 1 : static_cast<double>(done) / static_cast<double>(total);
  const int filled = static_cast<int>(std::floor(part * kWidth));
  std::string bar(static_cast<std::size_t>(filled), '#');
  bar.resize(kWidth, '.');
  const double rate = seconds > 0 ? static_cast<double>(done) / seconds : 0;
  char text[160];
  if (rate > 0 && done < total) {
    const double left = static_cast<double>(total - done) / rate;
    std::snprintf(text, sizeof text, "[%s] %zu/%zu pages  %.1f pages/s  %.0f s left", bar.c_str(), done, total, rate,
                  std::ceil(left));
  } else {
    std::snprintf(text, sizeof text, "[%s] %zu/%zu pages  %.1f pages/s", bar.c_str(), done, total, rate);
  }
  return text;
}

void ProgressBar::update(std::size_t done, std::size_t total) {
  const auto now = std::chrono::steady_clock::now();
  if (drawn_ && done < total && now - last_ < std::chrono::milliseconds(100)) return;
  last_ = now;
  const double seconds = std::chrono::duration<double>(now - start_).count();
  // "\r" returns to the line's start; ESC [ K clears what a longer line left (ECMA-48 EL).
  std::fprintf(out_, "\r%s\x1b[K", line(done, total, seconds).c_str());
  std::fflush(out_);
  drawn_ = true;
}

ProgressBar::~ProgressBar() {
  if (drawn_) std::fputc('\n', out_);
}

}  // namespace forme
