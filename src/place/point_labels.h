#pragma once
/// Point-feature label placement: put a text box next to each point so that
/// no two boxes overlap, boxes keep clear of other text and of the data, and
/// the preferred position is used where there is room.
///
/// ## Problem
/// Each label has an anchor point, a box size w × h, a priority, and a
/// policy for when it cannot be placed. The page supplies:
/// - an area that every box must stay inside (hard);
/// - obstacles, such as titles and tick labels, that no box may overlap (hard);
/// - data marks that boxes should avoid (soft, strongly penalised).
/// Two placed boxes never overlap (hard). "Overlap" means that interiors
/// meet; boxes that only touch do not overlap.
///
/// ## Candidates
/// Each label may take one of a few fixed positions around its anchor, at a
/// gap of `offset` (see LabelPosition). The default order of preference,
/// best first, is: upper right, upper left, lower right, lower left, right,
/// left, above, below. This order is attributed to E. Imhof, "Positioning
/// Names on Maps", *The American Cartographer* 2(2), 1975, but it is
/// recalled here, not checked against the paper. A secondhand quotation of
/// Slocum et al., *Thematic Cartography and Geographic Visualization* (2005),
/// after P. Yoeli (1972), gives UR, LR, UL, LL, above, below, right, left;
/// that is not checked either. Both put upper right first. The order is an
/// option. Some candidates are dropped before the search starts: those that
/// leave the area, those that meet an obstacle, and those whose own cost
/// (below) is at least that of leaving their label out. Leaving the label
/// out always beats such a candidate.
///
/// ## Cost
/// A layout gives each label one of its candidates or "left out". Its cost
/// is the sum of:
/// - `rank_cost` × the candidate's place in the preference order (0 = best);
/// - `mark_cost` × the number of data marks the box overlaps;
/// - `omit_cost` × priority, for each label left out;
/// - an overlap cost for each overlapping pair of boxes. It is twice the
///   largest leave-out cost, so leaving out either label always beats an
///   overlap.
///
/// ## Greedy (the baseline)
/// Take labels by priority, highest first, with ties by input order. Give
/// each label the cheapest candidate that overlaps no box already placed. If
/// there is none, or it costs more than leaving the label out, leave the
/// label out. With no marks, "cheapest" means the first free candidate in
/// preference order. Then run the leader step below.
///
/// ## Simulated annealing
/// After J. Christensen, J. Marks & S. Shieber, "An Empirical Study of
/// Algorithms for Point-Feature Label Placement", *ACM Transactions on
/// Graphics* 14(3):203–232, 1995.
/// 1. Start from the greedy layout, before its leader step.
/// 2. Make `moves_per_label` × n moves over 50 temperature stages, with T
///    falling geometrically. A move picks a random label and a random other
///    state for it (a candidate or "left out"). The change in cost, Δ, comes
///    from the label's own terms and one grid query on the new box; the
///    overlaps of the current box are kept as a count. The move is kept with
///    the Metropolis rule: always if Δ ≤ 0, otherwise with probability
///    exp(−Δ/T). T starts where leaving out the label with the highest
///    leave-out cost is accepted one time in three. It ends at the smallest
///    of `rank_cost` and `mark_cost`. The layout is kept at the end of each
///    stage if it is the cheapest seen so far, so the result never costs
///    more than its greedy start.
/// 3. Labels whose boxes still overlap are removed, lowest priority first
///    (see drop_overlapping). Because an overlap costs more than any
///    omission, this is a safety net that seldom removes anything.
/// 4. Polish: each placed label, by priority, moves to a cheaper free
///    candidate if there is one.
/// 5. The greedy step runs again for labels left out, in case room has
///    opened up. Then the leader step runs.
/// The random numbers come from std::mt19937_64 seeded with `seed`; nothing
/// else (no clock, no std::random_device) enters, so the same input and seed
/// give the same output, bit for bit. They are mapped to integers and reals
/// by hand rather than by std::*_distribution, whose mappings differ between
/// standard libraries, so the random stream is the same everywhere.
///
/// ## Leader step (both methods)
/// Each label still left out whose policy is `leader` is tried, by
/// priority, on rings of positions farther out (see leader.h). If a free
/// spot is found whose marks cost less than leaving the label out (the
/// rule the candidates follow), a straight leader line joins the box to
/// its point. Labels
/// still unplaced after this are listed in `left_out`. In the result, no
/// two boxes overlap, no box meets an obstacle, and every box lies inside
/// the area.
///
/// ## Cost of running
/// Candidates are scored against the obstacles and marks once, through a
/// uniform grid (spatial_index.h). Placed boxes live in a second grid that
/// is updated as labels move, so a move costs O(1) when label density is
/// bounded. Greedy is O(n log n); annealing adds O(n · moves_per_label).
#include <array>
#include <cstdint>
#include <optional>
#include <span>
#include <vector>

#include "base/geometry.h"

namespace forme {

/// Where a label box sits relative to its anchor. "Upper" means smaller y,
/// since the page's y axis points down. Corners put the box's nearest corner
/// `offset` away from the point on both axes. Sides centre the box on the
/// point vertically (right, left) or horizontally (above, below), with its
/// near edge `offset` away.
enum class LabelPosition {
  upper_right,
  upper_left,
  lower_right,
  lower_left,
  right,
  left,
  above,
  below
};

/// The eight positions in the default preference order (see the essay).
inline constexpr std::array<LabelPosition, 8> kEightPositions = {
    LabelPosition::upper_right, LabelPosition::upper_left, LabelPosition::lower_right,
    LabelPosition::lower_left,  LabelPosition::right,      LabelPosition::left,
    LabelPosition::above,       LabelPosition::below};
/// The four corner positions, the classic four-position model.
inline constexpr std::array<LabelPosition, 4> kCornerPositions = {
    LabelPosition::upper_right, LabelPosition::upper_left, LabelPosition::lower_right,
    LabelPosition::lower_left};

/// The box of a w × h label at `pos` around `anchor`, `offset` away.
Rect label_box(Point anchor, double w, double h, LabelPosition pos, double offset);

/// What to do with a label that finds no free candidate.
enum class IfUnplaced {
  leave_out,  ///< drop it and report it in PlacementResult::left_out
  leader,     ///< look farther out and join it to its point with a leader line
};

struct PointLabel {
  Point anchor;         ///< the data point being labelled
  double w = 0, h = 0;  ///< box size, > 0
  double priority = 1;  ///< > 0; a higher priority wins when labels compete
  IfUnplaced if_unplaced = IfUnplaced::leave_out;
};

struct PlacementProblem {
  Rect area;  ///< every box stays inside; must not be empty
  std::vector<PointLabel> labels;
  std::vector<Rect> obstacles;  ///< other text: boxes must not overlap these
  std::vector<Rect> marks;      ///< data marks to avoid; a 0 × 0 rect is a point
};

struct PlacementOptions {
  /// Candidate positions in preference order, best first.
  std::vector<LabelPosition> positions{kEightPositions.begin(), kEightPositions.end()};
  double offset = 2;  ///< gap between the point and the box, in points, ≥ 0

  double rank_cost = 1;    ///< per step down the preference order
  double mark_cost = 10;   ///< per data mark overlapped
  double omit_cost = 100;  ///< per unit of priority, for a label left out

  std::uint64_t seed = 1;        ///< annealing's random seed
  double moves_per_label = 100;  ///< annealing's move budget, per label

  int leader_rings = 6;    ///< rings tried by the leader search
  double leader_step = 0;  ///< distance between rings; 0 means the label's height
};

/// A straight leader line from the data point to the nearest point of the box.
struct Leader {
  Point from, to;
};

struct LabelPlacement {
  bool placed = false;
  Rect box;                      ///< valid when placed
  int candidate = -1;            ///< index into PlacementOptions::positions; -1 for leaders
  std::optional<Leader> leader;  ///< set when placed by the leader fallback
  int marks_overlapped = 0;      ///< data marks under the box
};

struct PlacementResult {
  std::vector<LabelPlacement> labels;  ///< one per input label, in input order
  std::vector<int> left_out;           ///< indices of unplaced labels, ascending
};

/// The greedy baseline. Throws std::invalid_argument on malformed input
/// (empty area, non-positive sizes or priorities, non-finite numbers).
PlacementResult place_labels_greedy(const PlacementProblem& problem,
                                    const PlacementOptions& options = {});

/// Simulated annealing, started from the greedy layout. Same contract.
///
///     PlacementProblem p{{0, 0, 500, 300}, {{{100, 100}, 40, 9}, {{110, 104}, 40, 9}}, {}, {}};
///     PlacementResult r = place_labels_annealing(p);
///     // r.labels[i].box, r.left_out
PlacementResult place_labels_annealing(const PlacementProblem& problem,
                                       const PlacementOptions& options = {});

/// The finishing rule on its own: the indices (ascending) of the boxes to
/// drop so that no two of the rest overlap. Among boxes that overlap others,
/// the lowest priority goes first, then the one with most overlaps, then the
/// later index. A box is skipped if its overlaps are already gone.
/// `priorities` is parallel to `boxes`.
std::vector<int> drop_overlapping(std::span<const Rect> boxes, std::span<const double> priorities);

}  // namespace forme
