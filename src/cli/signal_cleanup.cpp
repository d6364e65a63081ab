#include "cli/signal_cleanup.h"

#include <unistd.h>

#include <cstring>

namespace forme {

namespace {

// Written only while the signals are blocked or before `armed` is set; read
// by the handler.
char cleanup_path[4096];
volatile sig_atomic_t armed = 0;

void on_signal(int sig) {
  if (armed) ::unlink(cleanup_path);
  struct sigaction dfl {};
  dfl.sa_handler = SIG_DFL;
  sigemptyset(&dfl.sa_mask);
  ::sigaction(sig, &dfl, nullptr);
  ::raise(sig);
}

}  // namespace

void install_signal_cleanup() {
  struct sigaction sa {};
  sa.sa_handler = on_signal;
  sigemptyset(&sa.sa_mask);
  sigaddset(&sa.sa_mask, SIGINT);
  sigaddset(&sa.sa_mask, SIGTERM);
  const int signals[] = {SIGINT, SIGTERM};
  for (int sig : signals) {
    // Respect a shell that started us with the signal ignored (e.g. `nohup`).
    struct sigaction old {};
    ::sigaction(sig, nullptr, &old);
    if (old.sa_handler != SIG_IGN) ::sigaction(sig, &sa, nullptr);
  }
}

void set_cleanup_path(const char* path) {
  armed = 0;
  if (!path) return;
  const std::size_t n = std::strlen(path);
  if (n >= sizeof cleanup_path) return;
  std::memcpy(cleanup_path, path, n + 1);
  armed = 1;
}

SignalBlock::SignalBlock() {
  sigset_t block;
  sigemptyset(&block);
  sigaddset(&block, SIGINT);
  sigaddset(&block, SIGTERM);
  ::sigprocmask(SIG_BLOCK, &block, &saved_);
}

SignalBlock::~SignalBlock() { ::sigprocmask(SIG_SETMASK, &saved_, nullptr); }

}  // namespace forme
