#include "place/point_labels.h"

#include <algorithm>
#include <cmath>
#include <limits>
#include <numeric>
#include <random>
#include <stdexcept>

#include "place/leader.h"
#include "place/spatial_index.h"

namespace forme {

Rect label_box(Point a, double w, double h, LabelPosition pos, double offset) {
  const double right = a.x + offset, left = a.x - offset - w, centre_x = a.x - w / 2;
  const double upper = a.y - offset - h, lower = a.y + offset, centre_y = a.y - h / 2;
  switch (pos) {
    case LabelPosition::upper_right:
      return {right, upper, w, h};
    case LabelPosition::upper_left:
      return {left, upper, w, h};
    case LabelPosition::lower_right:
      return {right, lower, w, h};
    case LabelPosition::lower_left:
      return {left, lower, w, h};
    case LabelPosition::right:
      return {right, centre_y, w, h};
    case LabelPosition::left:
      return {left, centre_y, w, h};
    case LabelPosition::above:
      return {centre_x, upper, w, h};
    case LabelPosition::below:
      return {centre_x, lower, w, h};
  }
  return {right, upper, w, h};
}

namespace {

constexpr int kOmitted = -1;  // State::choice for a label left out
constexpr int kLeader = -2;   // State::choice for a label placed by the leader search
constexpr int kStages = 50;   // temperature steps in annealing

struct Candidate {
  Rect box;
  double cost = 0;  // rank and mark terms
  int position = 0;
  int marks = 0;
};

bool finite(const Rect& r) {
  return std::isfinite(r.x) && std::isfinite(r.y) && std::isfinite(r.w) && std::isfinite(r.h);
}

void validate(const PlacementProblem& p, const PlacementOptions& o) {
  auto fail = [](const char* what) {
    throw std::invalid_argument(std::string("place_labels: ") + what);
  };
  if (!finite(p.area) || p.area.empty()) fail("area must be finite and not empty");
  for (const PointLabel& l : p.labels) {
    if (!std::isfinite(l.anchor.x) || !std::isfinite(l.anchor.y)) fail("anchor not finite");
    if (!(l.w > 0 && l.h > 0) || !std::isfinite(l.w) || !std::isfinite(l.h))
      fail("label size must be finite and > 0");
    if (!(l.priority > 0) || !std::isfinite(l.priority)) fail("priority must be finite and > 0");
  }
  for (const Rect& r : p.obstacles)
    if (!finite(r)) fail("obstacle not finite");
  for (const Rect& r : p.marks)
    if (!finite(r)) fail("mark not finite");
  if (o.positions.empty()) fail("no candidate positions");
  if (!(o.offset >= 0) || !std::isfinite(o.offset)) fail("offset must be finite and >= 0");
  for (double c : {o.rank_cost, o.mark_cost, o.omit_cost, o.moves_per_label, o.leader_step})
    if (!(c >= 0) || !std::isfinite(c)) fail("costs, move budget and leader step must be >= 0");
  if (o.leader_rings < 0) fail("leader_rings must be >= 0");
}

constexpr int kNoLimit = std::numeric_limits<int>::max() - 1;

/// The largest whole number of marks k with k < x (x > 0), capped at kNoLimit.
int max_marks_below(double x) {
  return static_cast<int>(std::min(std::ceil(x) - 1, static_cast<double>(kNoLimit)));
}

/// A grid over `region` for `items` boxes of mean size w × h, with cells
/// `scale` times that size, and at most 16 cells per item (or 1024).
GridIndex grid_for(const Rect& region, double w, double h, std::size_t items, double scale = 1) {
  GridIndex grid(region, scale * w, scale * h, std::max<std::size_t>(1024, 16 * items));
  grid.reserve(items);
  return grid;
}

/// A grid over the problem's area for `items` boxes, with cells `scale`
/// times the mean label in size.
GridIndex make_grid(const PlacementProblem& p, std::size_t items, double scale = 1) {
  if (p.labels.empty()) return grid_for(p.area, p.area.w, p.area.h, items, scale);
  double w = 0, h = 0;
  for (const PointLabel& l : p.labels) {
    w += l.w;
    h += l.h;
  }
  const auto n = static_cast<double>(p.labels.size());
  return grid_for(p.area, w / n, h / n, items, scale);
}

/// The parts of a problem that do not change while searching: candidates
/// already scored against obstacles and marks, and the leave-out costs.
struct Scene {
  const PlacementProblem& problem;
  const PlacementOptions& options;
  GridIndex obstacles;
  GridIndex marks;
  std::vector<Candidate> candidates;
  std::vector<std::size_t> first;  // label i owns candidates [first[i], first[i + 1])
  std::vector<double> omit;        // leave-out cost per label
  double overlap_cost = 0;
  std::vector<int> by_priority;  // label indices, highest priority first, then by index

  Scene(const PlacementProblem& p, const PlacementOptions& o)
      : problem(p),
        options(o),
        obstacles(make_grid(p, p.obstacles.size())),
        // Marks are usually small: finer cells cut the items each query reads.
        marks(make_grid(p, p.marks.size(), 0.5)) {
    // Only things inside the area can meet a box, which always lies inside it.
    for (std::size_t k = 0; k < p.obstacles.size(); ++k)
      if (p.obstacles[k].overlaps(p.area)) obstacles.insert(static_cast<int>(k), p.obstacles[k]);
    for (std::size_t k = 0; k < p.marks.size(); ++k)
      if (p.marks[k].overlaps(p.area)) marks.insert(static_cast<int>(k), p.marks[k]);

    const std::size_t n = p.labels.size();
    first.reserve(n + 1);
    candidates.reserve(n * o.positions.size());
    omit.reserve(n);
    double max_omit = 0;
    for (const PointLabel& l : p.labels) {
      first.push_back(candidates.size());
      omit.push_back(o.omit_cost * l.priority);
      max_omit = std::max(max_omit, omit.back());
      for (std::size_t r = 0; r < o.positions.size(); ++r) {
        // A candidate that costs at least as much as leaving the label out
        // can never improve a layout, so it is dropped; counting marks can
        // stop as soon as it is known to be one.
        const double budget = omit.back() - static_cast<double>(r) * o.rank_cost;
        if (budget <= 0) continue;
        const Rect box = label_box(l.anchor, l.w, l.h, o.positions[r], o.offset);
        if (!within(box, p.area) || obstacles.any_overlap(box)) continue;
        const int most = o.mark_cost > 0 ? max_marks_below(budget / o.mark_cost) : kNoLimit;
        const int covered = marks.count_overlaps(box, -1, most);
        if (covered > most) continue;
        candidates.push_back({box, static_cast<double>(r) * o.rank_cost + covered * o.mark_cost,
                              static_cast<int>(r), covered});
      }
    }
    first.push_back(candidates.size());
    overlap_cost = std::max(2 * max_omit, 1.0);

    by_priority.resize(n);
    std::iota(by_priority.begin(), by_priority.end(), 0);
    std::stable_sort(by_priority.begin(), by_priority.end(), [&](int a, int b) {
      return p.labels[static_cast<std::size_t>(a)].priority >
             p.labels[static_cast<std::size_t>(b)].priority;
    });
  }

  std::size_t count(int i) const { return first[idx(i) + 1] - first[idx(i)]; }
  static std::size_t idx(int i) { return static_cast<std::size_t>(i); }
};

/// A layout being searched: each label's choice, and the placed boxes.
struct State {
  std::vector<int> choice;  // candidate index, kOmitted or kLeader
  GridIndex placed;         // the box of every placed label, keyed by label index
  std::vector<std::optional<LeaderSpot>> leaders;

  explicit State(const Scene& s)
      : choice(s.problem.labels.size(), kOmitted),
        placed(make_grid(s.problem, s.problem.labels.size())),
        leaders(s.problem.labels.size()) {}

  void set(const Scene& s, int i, int c) {
    placed.remove(i);
    choice[Scene::idx(i)] = c;
    if (c >= 0) placed.insert(i, s.candidates[static_cast<std::size_t>(c)].box);
  }
};

/// Label i's cheapest candidate that costs less than `below` and overlaps
/// no placed box (other than i's own); kOmitted if there is none.
int cheapest_free(const Scene& s, const State& st, int i, double below) {
  int best = kOmitted;
  for (std::size_t c = s.first[Scene::idx(i)]; c < s.first[Scene::idx(i) + 1]; ++c) {
    const Candidate& cand = s.candidates[c];
    if (cand.cost < below && !st.placed.any_overlap(cand.box, i)) {
      best = static_cast<int>(c);
      below = cand.cost;
    }
  }
  return best;
}

/// Gives each label still left out, in `s.by_priority` order, its cheapest
/// free candidate, when that beats leaving it out.
void fill_greedily(const Scene& s, State& st) {
  for (int i : s.by_priority) {
    if (st.choice[Scene::idx(i)] != kOmitted) continue;
    const int best = cheapest_free(s, st, i, s.omit[Scene::idx(i)]);
    if (best != kOmitted) st.set(s, i, best);
  }
}

/// Moves each placed label, by priority, to its cheapest candidate that
/// overlaps no other box, if that is cheaper than where it is: a descent
/// step that settles the rank and mark terms after annealing.
void polish(const Scene& s, State& st) {
  for (int i : s.by_priority) {
    const int current = st.choice[Scene::idx(i)];
    if (current < 0) continue;
    const int best = cheapest_free(s, st, i, s.candidates[static_cast<std::size_t>(current)].cost);
    if (best != kOmitted) st.set(s, i, best);
  }
}

/// Removes placed labels until no two boxes overlap (see drop_overlapping).
void remove_overlaps(const Scene& s, State& st) {
  std::vector<int> ids;
  std::vector<Rect> boxes;
  std::vector<double> priorities;
  for (std::size_t i = 0; i < st.choice.size(); ++i) {
    if (!st.placed.contains(static_cast<int>(i))) continue;
    ids.push_back(static_cast<int>(i));
    boxes.push_back(st.placed.rect(static_cast<int>(i)));
    priorities.push_back(s.problem.labels[i].priority);
  }
  for (int k : drop_overlapping(boxes, priorities)) st.set(s, ids[Scene::idx(k)], kOmitted);
}

void place_leaders(const Scene& s, State& st) {
  const PlacementOptions& o = s.options;
  for (int i : s.by_priority) {
    const PointLabel& l = s.problem.labels[Scene::idx(i)];
    if (st.choice[Scene::idx(i)] != kOmitted || l.if_unplaced != IfUnplaced::leader) continue;
    const LeaderSearch search{o.offset, o.leader_step > 0 ? o.leader_step : l.h, o.leader_rings};
    auto spot = find_leader_spot(l.anchor, l.w, l.h, s.problem.area, s.obstacles, st.placed,
                                 s.marks, search);
    // The candidates' rule holds out here too: a spot whose marks cost as
    // much as leaving the label out is no better than leaving it out.
    if (!spot || spot->marks * o.mark_cost >= o.omit_cost * l.priority) continue;
    st.choice[Scene::idx(i)] = kLeader;
    st.placed.insert(i, spot->box);
    st.leaders[Scene::idx(i)] = spot;
  }
}

// Random numbers mapped by hand so that every standard library gives the same stream.
std::size_t uniform_below(std::mt19937_64& rng, std::size_t n) {
  return static_cast<std::size_t>(rng() % n);  // bias below n / 2^64: irrelevant here
}
double uniform_open(std::mt19937_64& rng) {  // uniform in (0, 1]
  return static_cast<double>((rng() >> 11) + 1) * 0x1.0p-53;
}

/// Simulated annealing over the candidates, starting from st.
void anneal(const Scene& s, State& st) {
  const PlacementOptions& o = s.options;
  std::vector<int> movable;
  for (std::size_t i = 0; i < s.problem.labels.size(); ++i)
    if (s.count(static_cast<int>(i)) > 0) movable.push_back(static_cast<int>(i));
  const auto total_moves =
      static_cast<long long>(std::llround(o.moves_per_label * static_cast<double>(movable.size())));
  if (movable.empty() || total_moves <= 0) return;

  const double w = s.overlap_cost;
  auto own_cost = [&](int i, int c) {
    return c < 0 ? s.omit[Scene::idx(i)] : s.candidates[static_cast<std::size_t>(c)].cost;
  };
  // overlaps[i]: how many placed boxes label i's box overlaps (0 when left out).
  std::vector<int> overlaps(st.choice.size(), 0);
  double cost = 0;
  for (std::size_t i = 0; i < st.choice.size(); ++i) {
    const int id = static_cast<int>(i);
    cost += own_cost(id, st.choice[i]);
    if (st.placed.contains(id)) overlaps[i] = st.placed.count_overlaps(st.placed.rect(id), id);
    cost += w / 2 * overlaps[i];
  }
  double best_cost = cost;
  std::vector<int> best = st.choice;

  // Start where leaving out a label (Δ = the largest omit cost, w/2) is
  // accepted one time in three; end where a one-step rank change is accepted
  // about one time in three. Tuned on the bench's set-ups: a cooler start
  // wastes the moves, and a cooler end gains nothing that the polish step
  // after annealing does not.
  double smallest = w;
  for (double c : {o.rank_cost, o.mark_cost})
    if (c > 0) smallest = std::min(smallest, c);
  const double t_start = w / 2 / std::log(3.0);
  const double t_end = std::min(t_start, smallest);
  const double cooling = std::pow(t_end / t_start, 1.0 / (kStages - 1));

  std::mt19937_64 rng(o.seed);
  double t = t_start;
  for (int stage = 0; stage < kStages; ++stage, t *= cooling) {
    const long long moves = total_moves / kStages + (stage < total_moves % kStages ? 1 : 0);
    for (long long m = 0; m < moves; ++m) {
      const int i = movable[uniform_below(rng, movable.size())];
      const std::size_t base = s.first[Scene::idx(i)], k = s.count(i);
      const int old_c = st.choice[Scene::idx(i)];
      // States 0 … k−1 are candidates and k is "left out"; draw one other than the current.
      const std::size_t cur = old_c < 0 ? k : static_cast<std::size_t>(old_c) - base;
      std::size_t next = uniform_below(rng, k);
      if (next >= cur) ++next;
      const int new_c = next == k ? kOmitted : static_cast<int>(base + next);

      // Metropolis rule in threshold form: accept iff Δ ≤ −T·ln u, u uniform
      // in (0, 1]. Knowing the threshold first lets the overlap count stop early.
      const double threshold = -t * std::log(uniform_open(rng));
      double delta = own_cost(i, new_c) - own_cost(i, old_c) - w * overlaps[Scene::idx(i)];
      if (delta > threshold) continue;
      int new_overlaps = 0;
      if (new_c >= 0) {
        const Rect& box = s.candidates[static_cast<std::size_t>(new_c)].box;
        const int limit = static_cast<int>(std::min((threshold - delta) / w, 1e9));
        new_overlaps = st.placed.count_overlaps(box, i, limit);
        delta += w * new_overlaps;
        if (delta > threshold) continue;
      }
      if (old_c >= 0)
        st.placed.query(st.placed.rect(i),
                        [&](int j, const Rect&) { overlaps[Scene::idx(j)] -= j != i; });
      st.set(s, i, new_c);
      if (new_c >= 0)
        st.placed.query(st.placed.rect(i),
                        [&](int j, const Rect&) { overlaps[Scene::idx(j)] += j != i; });
      overlaps[Scene::idx(i)] = new_overlaps;
      cost += delta;
    }
    if (cost < best_cost) {
      best_cost = cost;
      best = st.choice;
    }
  }
  for (std::size_t i = 0; i < best.size(); ++i)
    if (best[i] != st.choice[i]) st.set(s, static_cast<int>(i), best[i]);
}

/// Greedy fill for whatever is left out, leader lines, then the result.
PlacementResult finish(const Scene& s, State& st) {
  fill_greedily(s, st);
  place_leaders(s, st);

  PlacementResult result;
  result.labels.resize(st.choice.size());
  for (std::size_t i = 0; i < st.choice.size(); ++i) {
    LabelPlacement& out = result.labels[i];
    const int c = st.choice[i];
    if (c == kOmitted) {
      result.left_out.push_back(static_cast<int>(i));
    } else if (c == kLeader) {
      out.placed = true;
      out.box = st.leaders[i]->box;
      out.leader = st.leaders[i]->leader;
      out.marks_overlapped = st.leaders[i]->marks;
    } else {
      const Candidate& cand = s.candidates[static_cast<std::size_t>(c)];
      out.placed = true;
      out.box = cand.box;
      out.candidate = cand.position;
      out.marks_overlapped = cand.marks;
    }
  }
  return result;
}

}  // namespace

std::vector<int> drop_overlapping(std::span<const Rect> boxes, std::span<const double> priorities) {
  if (boxes.size() != priorities.size())
    throw std::invalid_argument("drop_overlapping: boxes and priorities differ in length");
  if (boxes.empty()) return {};
  Rect region = boxes.front();
  double w = 0, h = 0;
  for (const Rect& b : boxes) {
    region = region.united(b);
    w += b.w;
    h += b.h;
  }
  const auto n = static_cast<double>(boxes.size());
  GridIndex grid = grid_for(region, w / n, h / n, boxes.size());
  for (std::size_t i = 0; i < boxes.size(); ++i) grid.insert(static_cast<int>(i), boxes[i]);

  std::vector<int> overlaps(boxes.size(), 0);
  std::vector<int> conflicted;
  for (std::size_t i = 0; i < boxes.size(); ++i) {
    overlaps[i] = grid.count_overlaps(boxes[i], static_cast<int>(i));
    if (overlaps[i] > 0) conflicted.push_back(static_cast<int>(i));
  }
  auto at = [](const auto& v, int i) { return v[static_cast<std::size_t>(i)]; };
  std::sort(conflicted.begin(), conflicted.end(), [&](int a, int b) {
    if (at(priorities, a) != at(priorities, b)) return at(priorities, a) < at(priorities, b);
    if (at(overlaps, a) != at(overlaps, b)) return at(overlaps, a) > at(overlaps, b);
    return a > b;
  });
  // Overlap counts only fall as boxes go, so one pass in this order suffices.
  std::vector<int> dropped;
  for (int i : conflicted) {
    if (at(overlaps, i) == 0) continue;
    grid.remove(i);
    grid.query(boxes[static_cast<std::size_t>(i)],
               [&](int j, const Rect&) { --overlaps[static_cast<std::size_t>(j)]; });
    dropped.push_back(i);
  }
  std::sort(dropped.begin(), dropped.end());
  return dropped;
}

PlacementResult place_labels_greedy(const PlacementProblem& problem,
                                    const PlacementOptions& options) {
  validate(problem, options);
  const Scene scene(problem, options);
  State state(scene);
  return finish(scene, state);
}

PlacementResult place_labels_annealing(const PlacementProblem& problem,
                                       const PlacementOptions& options) {
  validate(problem, options);
  const Scene scene(problem, options);
  State state(scene);
  fill_greedily(scene, state);
  anneal(scene, state);
  remove_overlaps(scene, state);
  polish(scene, state);
  return finish(scene, state);  // fills spots the steps above freed
}

}  // namespace forme
