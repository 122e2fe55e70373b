/**
 * Angles in the plane of a diagram, in degrees, counter-clockwise from +x with y pointing up.
 * Used to put lone pairs, odd electrons and charges in the free directions round an atom.
 */

/** An angle brought into [0, 360). */
export function normalised(angle: number): number {
  const turned = angle % 360;
  return turned < 0 ? turned + 360 : turned;
}

/** Smallest difference between two angles, 0 to 180. */
export function angularDistance(first: number, second: number): number {
  const difference = Math.abs(normalised(first) - normalised(second));
  return difference > 180 ? 360 - difference : difference;
}

/**
 * `count` directions spread through the gaps between the `occupied` ones, each gap taking a share
 * that keeps the spacing as wide as possible. With nothing occupied they start straight up and go
 * round evenly (the four pairs of a lone atom sit above, left, below and right).
 */
export function spreadInGaps(occupied: readonly number[], count: number): number[] {
  if (count <= 0) return [];
  if (occupied.length === 0) {
    return Array.from({ length: count }, (_, k) => normalised(90 + (360 * k) / count));
  }
  const sorted = occupied.map(normalised).sort((a, b) => a - b);
  const gaps = sorted.map((start, k) => {
    const end = k + 1 < sorted.length ? sorted[k + 1] : sorted[0] + 360;
    return { start, size: end - start, share: 0 };
  });
  for (let placed = 0; placed < count; placed++) {
    let best = gaps[0];
    // Widest spacing after adding one more; ties go to the gap met first, which keeps it stable.
    for (const gap of gaps) if (gap.size / (gap.share + 2) > best.size / (best.share + 2) + 1e-9) best = gap;
    best.share++;
  }
  const directions: number[] = [];
  for (const gap of gaps) {
    for (let k = 1; k <= gap.share; k++) directions.push(normalised(gap.start + (gap.size * k) / (gap.share + 1)));
  }
  return directions;
}

/** The candidate direction furthest from every occupied one (ties: the earlier candidate). */
export function clearestDirection(occupied: readonly number[], candidates: readonly number[]): number {
  let best = candidates[0];
  let bestClearance = -1;
  for (const candidate of candidates) {
    let clearance = 360;
    for (const angle of occupied) clearance = Math.min(clearance, angularDistance(candidate, angle));
    if (clearance > bestClearance + 1e-9) {
      best = candidate;
      bestClearance = clearance;
    }
  }
  return best;
}
