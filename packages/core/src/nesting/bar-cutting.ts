/** A piece to cut from linear stock (T-track, rod, dowel, moulding). */
export interface BarPiece {
  name: string;
  length: number;
}

export interface BarOptions {
  /** Stock lengths on sale, mm. */
  barLengths: readonly number[];
  /** Width of the saw cut, mm. */
  kerf?: number;
  /** Taken off each end of a bar before cutting (checked or damaged ends), mm. */
  endTrim?: number;
  /** Search effort per bar for the best-filling set of pieces. */
  searchBudget?: number;
}

export interface BarPlanBar {
  length: number;
  pieces: { name: string; length: number; offset: number }[];
  /** Bar length not in pieces, kerfs included. */
  offcut: number;
}

export interface BarPlan {
  bars: BarPlanBar[];
  /** Pieces longer than every bar. */
  unplaced: BarPiece[];
  totalLength: number;
  /** Fewest bars the pieces could need: their total length over the longest bar, rounded up. */
  lowerBound: number;
}

/**
 * One-dimensional cutting stock: pieces cut from bars with a kerf between cuts, using as few bars
 * as the heuristics find. A piece takes its length plus one kerf and a bar holds its length plus
 * one kerf, since the last piece needs no cut after it (four 2 in strips with 1/8 in kerf need
 * 8-3/8 in). The plan is the better of first-fit decreasing and a minimum-slack search that fills
 * each bar in turn with the set of pieces leaving the least waste (Gupta & Ho 1999; with the
 * largest piece fixed, Fleszar & Hindi 2002 [memory]).
 */
export function cutBars(pieces: readonly BarPiece[], options: BarOptions): BarPlan {
  const kerf = options.kerf ?? 0;
  const endTrim = options.endTrim ?? 0;
  const lengths = [...options.barLengths].filter((l) => l > 0).sort((a, b) => a - b);
  const longest = lengths[lengths.length - 1] ?? 0;
  const capacity = longest - 2 * endTrim + kerf;
  const fits = (piece: BarPiece): boolean => piece.length + kerf <= capacity + 1e-9;
  const placeable = pieces.filter(fits);
  const unplaced = pieces.filter((piece) => !fits(piece));
  const sizes = placeable.map((piece) => piece.length + kerf);
  const ffd = firstFitDecreasing(sizes, capacity);
  const slack = minimumSlack(sizes, capacity, options.searchBudget ?? 5000);
  const bins = slack.length < ffd.length ? slack : ffd;
  const bars = bins.map((bin) => {
    const used = bin.reduce((sum, i) => sum + (sizes[i] as number), 0);
    const length = lengths.find((l) => l - 2 * endTrim + kerf >= used - 1e-9) ?? longest;
    let offset = endTrim;
    const cut = bin
      .map((i) => placeable[i] as BarPiece)
      .sort((a, b) => b.length - a.length)
      .map((piece) => {
        const at = offset;
        offset += piece.length + kerf;
        return { name: piece.name, length: piece.length, offset: at };
      });
    const material = cut.reduce((sum, piece) => sum + piece.length, 0);
    return { length, pieces: cut, offcut: length - material };
  });
  const total = sizes.reduce((sum, size) => sum + size, 0);
  return {
    bars,
    unplaced,
    totalLength: bars.reduce((sum, bar) => sum + bar.length, 0),
    lowerBound: capacity > 0 ? Math.ceil(total / capacity - 1e-9) : 0,
  };
}

/** Bins as lists of item indices, first-fit on items sorted longest first. */
export function firstFitDecreasing(sizes: readonly number[], capacity: number): number[][] {
  const order = [...sizes.keys()].sort((i, j) => (sizes[j] as number) - (sizes[i] as number));
  const bins: number[][] = [];
  const free: number[] = [];
  for (const i of order) {
    const size = sizes[i] as number;
    const bin = free.findIndex((room) => room >= size - 1e-9);
    if (bin >= 0) {
      (bins[bin] as number[]).push(i);
      free[bin] = (free[bin] as number) - size;
    } else {
      bins.push([i]);
      free.push(capacity - size);
    }
  }
  return bins;
}

/** Fills one bin at a time with the largest item left plus the subset leaving the least slack. */
export function minimumSlack(sizes: readonly number[], capacity: number, budget: number): number[][] {
  const remaining = [...sizes.keys()].sort((i, j) => (sizes[j] as number) - (sizes[i] as number));
  const bins: number[][] = [];
  while (remaining.length > 0) {
    const first = remaining.shift() as number;
    const room = capacity - (sizes[first] as number);
    const chosen = bestSubset(
      remaining.map((i) => sizes[i] as number),
      room,
      budget,
    );
    const picked = new Set(chosen);
    bins.push([first, ...chosen.map((k) => remaining[k] as number)]);
    for (let k = remaining.length - 1; k >= 0; k -= 1) if (picked.has(k)) remaining.splice(k, 1);
  }
  return bins;
}

/** Indices (into `sizes`, sorted longest first) of a subset whose sum comes closest to `room` from below. */
function bestSubset(sizes: readonly number[], room: number, budget: number): number[] {
  let best: number[] = [];
  let bestSlack = room;
  let nodes = 0;
  const stack: number[] = [];
  // Suffix sums let a branch stop when even all the rest could not beat the best slack.
  const suffix = new Float64Array(sizes.length + 1);
  for (let i = sizes.length - 1; i >= 0; i -= 1) suffix[i] = (suffix[i + 1] as number) + (sizes[i] as number);
  const search = (start: number, left: number): void => {
    if (left < bestSlack - 1e-9) {
      bestSlack = left;
      best = [...stack];
    }
    for (let i = start; i < sizes.length && nodes < budget && bestSlack > 1e-9; i += 1) {
      const size = sizes[i] as number;
      if (size > left + 1e-9) continue;
      if (left - (suffix[i] as number) >= bestSlack - 1e-9) return;
      // Equal sizes in a row: trying the second after skipping the first repeats a branch.
      if (i > start && sizes[i - 1] === size) continue;
      nodes += 1;
      stack.push(i);
      search(i + 1, left - size);
      stack.pop();
    }
  };
  search(0, room);
  return best;
}
