#pragma once
/// Results 0 … n-1 of `make`, handed out in order, made on one worker thread
/// up to `depth` ahead of the reader: page k+1 and k+2 are composed while
/// page k is painted. Order is fixed, so the output does not depend on
/// timing. Without a worker (`threaded` false) each result is made when it
/// is asked for. What `make` throws is thrown again by `next` for that index.
#include <condition_variable>
#include <cstddef>
#include <deque>
#include <exception>
#include <functional>
#include <mutex>
#include <optional>
#include <thread>
#include <utility>

namespace forme {

template <class T>
class Lookahead {
 public:
  Lookahead(std::size_t n, std::size_t depth, std::function<T(std::size_t)> make, bool threaded)
      : n_(n), depth_(depth < 1 ? 1 : depth), make_(std::move(make)) {
    if (threaded && n_ > 0) worker_ = std::thread([this] { run(); });
  }
  ~Lookahead() {
    {
      std::lock_guard lock(mutex_);
      stop_ = true;
    }
    changed_.notify_all();
    if (worker_.joinable()) worker_.join();
  }
  Lookahead(const Lookahead&) = delete;
  Lookahead& operator=(const Lookahead&) = delete;

  /// The next result in order; call at most n times.
  T next() {
    if (!worker_.joinable()) return make_(taken_++);
    std::unique_lock lock(mutex_);
    changed_.wait(lock, [this] { return !ready_.empty(); });
    Slot slot = std::move(ready_.front());
    ready_.pop_front();
    ++taken_;
    lock.unlock();
    changed_.notify_all();
    if (slot.error) std::rethrow_exception(slot.error);
    return std::move(*slot.value);
  }

 private:
  struct Slot {
    std::optional<T> value;
    std::exception_ptr error;
  };

  void run() {
    for (std::size_t i = 0; i < n_; ++i) {
      {
        std::unique_lock lock(mutex_);
        changed_.wait(lock, [&] { return stop_ || i < taken_ + depth_; });
        if (stop_) return;
      }
      Slot slot;
      try {
        slot.value.emplace(make_(i));
      } catch (...) {
        slot.error = std::current_exception();
      }
      const bool failed = slot.error != nullptr;
      {
        std::lock_guard lock(mutex_);
        ready_.push_back(std::move(slot));
      }
      changed_.notify_all();
      if (failed) return;  // the reader stops at the failure
    }
  }

  const std::size_t n_, depth_;
  std::function<T(std::size_t)> make_;
  std::mutex mutex_;
  std::condition_variable changed_;
  std::deque<Slot> ready_;
  std::size_t taken_ = 0;
  bool stop_ = false;
  std::thread worker_;  ///< last: started once everything above exists
};

}  // namespace forme
