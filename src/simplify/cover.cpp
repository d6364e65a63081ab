#include "simplify/cover.h"

#include <algorithm>
#include <array>
#include <cstdint>

#include "simplify/capsule.h"

namespace forme {

namespace {

constexpr int kReach = 2;  // drawn segments checked on each side of a home
// A home longer than this that falls short is split at its middle rather
// than at its worst point, so no stretch is scanned more than about
// log2(n / kLongHome) times over, whatever the shape.
constexpr std::uint32_t kLongHome = 4096;

/// A drawn segment ready for many distance queries.
struct Seg {
  Point a, b;
  double dx = 0, dy = 0, inv_len2 = 0;

  Seg() = default;
  Seg(Point p, Point q) : a(p), b(q), dx(q.x - p.x), dy(q.y - p.y) {
    const double len2 = dx * dx + dy * dy;
    inv_len2 = len2 > 0 ? 1 / len2 : 0;
  }
  double distance2(Point p) const {
    const double t = std::clamp(((p.x - a.x) * dx + (p.y - a.y) * dy) * inv_len2, 0.0, 1.0);
    const double ex = a.x + t * dx - p.x, ey = a.y + t * dy - p.y;
    return ex * ex + ey * ey;
  }
};

/// The kept points as a doubly linked list of nodes (new ones appended,
/// so the memory follows the points kept, not the series' length) and a
/// stack of homes, named by their first node, still to check.
class Cover {
 public:
  Cover(std::span<const Point> pts, const std::vector<std::size_t>& kept, double r) : pts_(pts), r_(r), r2_(r * r) {
    const auto m = static_cast<std::uint32_t>(kept.size());
    nodes_.reserve(m + m / 2);
    for (std::uint32_t k = 0; k < m; ++k) nodes_.push_back({static_cast<std::uint32_t>(kept[k]), k + 1, k - 1, 0});
    tail_ = m - 1;
    for (std::uint32_t k = tail_; k-- > 0;) push(k);
  }

  std::vector<std::size_t> run() {
    while (!work_.empty()) {
      const std::uint32_t a = work_.back();
      work_.pop_back();
      nodes_[a].queued = 0;
      check(a);
    }
    std::vector<std::size_t> out;
    out.reserve(nodes_.size());
    for (std::uint32_t k = head_;; k = nodes_[k].next) {
      out.push_back(nodes_[k].at);
      if (k == tail_) break;
    }
    return out;
  }

 private:
  struct Node {
    std::uint32_t at, next, prev;  // index into pts; neighbouring nodes
    char queued;
  };

  Point pt(std::uint32_t node) const { return pts_[nodes_[node].at]; }

  void push(std::uint32_t a) {
    if (a == tail_ || nodes_[a].queued) return;
    nodes_[a].queued = 1;
    work_.push_back(a);
  }

  /// Keeps point i, which lies inside home a, and queues every home whose
  /// nearby segments include one of the two it leaves in place of a's.
  /// Returns the new node.
  std::uint32_t keep(std::uint32_t a, std::uint32_t i) {
    const std::uint32_t b = nodes_[a].next, p = static_cast<std::uint32_t>(nodes_.size());
    nodes_.push_back({i, b, a, 0});
    nodes_[a].next = p;
    nodes_[b].prev = p;
    // Neighbours first, so that the two halves are checked (and split
    // further) before them.
    for (std::uint32_t s = 0, h = a; s < kReach && h != head_; ++s) push(h = nodes_[h].prev);
    for (std::uint32_t s = 0, h = b; s < kReach && h != tail_; ++s, h = nodes_[h].next) push(h);
    push(p);
    push(a);
    return p;
  }

  /// Checks home a; keeps one point (or the two ends of one segment) and
  /// returns at the first shortfall, since keeping changes the home.
  void check(std::uint32_t a) {
    const std::uint32_t b = nodes_[a].next, ia = nodes_[a].at, ib = nodes_[b].at;
    if (ib == ia + 1) return;  // an original segment, drawn as it is
    // The nearby drawn segments, the home first, then outwards.
    segs_[0] = Seg(pt(a), pt(b));
    int n = 1;
    for (std::uint32_t s = 0, lo = a, hi = b; s < kReach; ++s) {
      if (lo != head_) segs_[n++] = Seg(pt(nodes_[lo].prev), pt(lo)), lo = nodes_[lo].prev;
      if (hi != tail_) segs_[n++] = Seg(pt(hi), pt(nodes_[hi].next)), hi = nodes_[hi].next;
    }
    nsegs_ = n;

    first_.resize(ib - ia + 1);
    first_[0] = first_[ib - ia] = 0;
    double worst = -1;
    std::uint32_t worst_at = 0;
    for (std::uint32_t i = ia + 1; i < ib; ++i) {
      const int f = first_cover(pts_[i]);
      first_[i - ia] = static_cast<std::int8_t>(f);
      if (f >= 0) continue;
      const double d2 = segs_[0].distance2(pts_[i]);
      if (d2 > worst) worst = d2, worst_at = i;
    }
    // Like Douglas–Peucker: of the points nothing covers, the one farthest
    // from the home segment.
    if (worst >= 0) {
      keep(a, ib - ia > kLongHome ? ia + (ib - ia) / 2 : worst_at);
      return;
    }

    for (std::uint32_t i = ia; i < ib; ++i) {
      const int f0 = first_[i - ia], f1 = first_[i + 1 - ia];
      const Point p = pts_[i], q = pts_[i + 1];
      if (f0 == f1 || segs_[f0].distance2(q) <= r2_ || segs_[f1].distance2(p) <= r2_) continue;
      if (spans_cover(p, q)) continue;
      if (i != ia) a = keep(a, i);
      if (i + 1 != ib) keep(a, i + 1);
      return;
    }
  }

  /// The first nearby segment (in checking order) within r of p, or −1.
  int first_cover(Point p) const {
    for (int s = 0; s < nsegs_; ++s)
      if (segs_[s].distance2(p) <= r2_) return s;
    return -1;
  }

  /// Whether the nearby segments together come within r of all of pq.
  bool spans_cover(Point p, Point q) {
    std::array<Span, 2 * kReach + 1> spans;
    int n = 0;
    for (int s = 0; s < nsegs_; ++s) {
      const Span sp = span_within(p, q, segs_[s].a, segs_[s].b, r_);
      if (sp.lo <= sp.hi) spans[n++] = sp;
    }
    for (int k = 1; k < n; ++k)  // a handful: insertion sort by lo
      for (int m = k; m > 0 && spans[m].lo < spans[m - 1].lo; --m) std::swap(spans[m], spans[m - 1]);
    double reach = 0;
    for (int k = 0; k < n; ++k) {
      if (spans[k].lo > reach) return false;
      reach = std::max(reach, spans[k].hi);
    }
    return reach >= 1;
  }

  std::span<const Point> pts_;
  double r_, r2_;
  std::vector<Node> nodes_;
  std::vector<std::uint32_t> work_;
  std::uint32_t head_ = 0, tail_ = 0;
  std::array<Seg, 2 * kReach + 1> segs_;
  int nsegs_ = 0;
  std::vector<std::int8_t> first_;
};

}  // namespace

std::vector<std::size_t> ensure_cover(std::span<const Point> pts, std::vector<std::size_t> kept, double r) {
  if (kept.size() < 2) return kept;
  return Cover(pts, kept, r).run();
}

}  // namespace forme
