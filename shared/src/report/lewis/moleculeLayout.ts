/**
 * A flat layout for a species with several centres, with no bond crossing another where the
 * graph allows: rings are regular polygons, fused rings share an edge and open away from the
 * rings already drawn, and chains leave each atom the way Lewis structures are drawn (four
 * domains in a cross, three at 120° in a zigzag, two in a straight line), lone pairs keeping
 * room of their own. What still collides afterwards is repaired by mirroring or turning the
 * branch beyond a chain bond, whichever removes most collisions.
 */
import { findBridges } from "../../chemistry/smiles/bridges";
import type { MolecularGraph } from "../../chemistry/types";
import { angularDistance, normalised, spreadInGaps } from "./directions";
import type { DiagramLayout } from "./layoutTypes";

/** Past this many atoms a diagram stops being legible at any size an editor shows. */
export const MAX_DIAGRAM_ATOMS = 150;
/** Repair passes over the chain bonds; each pass keeps only a move that removes collisions. */
const MAX_REPAIR_PASSES = 20;

interface Mutable {
  x: number;
  y: number;
}

const toRadians = (degrees: number): number => (degrees * Math.PI) / 180;
const angleOf = (from: Mutable, to: Mutable): number => normalised((Math.atan2(to.y - from.y, to.x - from.x) * 180) / Math.PI);

/** The layout of any connected or disconnected graph of at most {@link MAX_DIAGRAM_ATOMS} atoms. */
export function moleculeLayout(graph: MolecularGraph): DiagramLayout {
  const atomCount = graph.atoms.length;
  const adjacency: number[][] = graph.atoms.map(() => []);
  for (const { from, to } of graph.bonds) {
    if (from === to || from >= atomCount || to >= atomCount) continue;
    adjacency[from].push(to);
    adjacency[to].push(from);
  }
  const bridge = findBridges(atomCount, graph.bonds);
  const ringAdjacency: number[][] = graph.atoms.map(() => []);
  graph.bonds.forEach(({ from, to }, index) => {
    if (bridge[index] === 1 || from === to) return;
    ringAdjacency[from].push(to);
    ringAdjacency[to].push(from);
  });
  const rings = smallestRings(graph, bridge, ringAdjacency);
  const systemOf = ringSystems(atomCount, ringAdjacency);

  const positions: Mutable[] = graph.atoms.map(() => ({ x: 0, y: 0 }));
  const placed = new Uint8Array(atomCount);
  const turn = new Int8Array(atomCount);
  const domains = graph.atoms.map((atom, index) => adjacency[index].length + atom.lonePairs + (atom.unpairedElectrons > 0 ? 1 : 0));
  const branchWeight = (from: number, into: number): number => reachableWithout(adjacency, into, from);

  const placeSystem = (system: number, anchor: number, anchorAt: Mutable, towardParent: number | undefined): number[] => {
    const members = rings.filter((ring) => systemOf[ring[0]] === system);
    const local = layoutRingSystem(members);
    const anchorLocal = local.get(anchor)!;
    let rotation = 0;
    if (towardParent !== undefined) {
      const ringNeighbours = ringAdjacency[anchor].map((other) => angleOf(anchorLocal, local.get(other)!));
      const outward = spreadInGaps(ringNeighbours, 1)[0];
      rotation = towardParent - outward;
    }
    const cos = Math.cos(toRadians(rotation));
    const sin = Math.sin(toRadians(rotation));
    const atoms: number[] = [];
    for (const [atom, point] of local) {
      const dx = point.x - anchorLocal.x;
      const dy = point.y - anchorLocal.y;
      positions[atom] = { x: anchorAt.x + dx * cos - dy * sin, y: anchorAt.y + dx * sin + dy * cos };
      placed[atom] = 1;
      atoms.push(atom);
    }
    return atoms;
  };

  let offsetX = 0;
  for (let start = 0; start < atomCount; start++) {
    if (placed[start]) continue;
    const component = componentOf(adjacency, start);
    const root = chooseRoot(component, adjacency, systemOf, rings);
    const queue: number[] = [];
    if (systemOf[root] >= 0) queue.push(...placeSystem(systemOf[root], root, { x: 0, y: 0 }, undefined));
    else {
      positions[root] = { x: 0, y: 0 };
      placed[root] = 1;
      queue.push(root);
    }
    for (let head = 0; head < queue.length; head++) {
      const atom = queue[head];
      const unplaced = adjacency[atom].filter((other) => !placed[other]);
      if (unplaced.length === 0) continue;
      const occupied = adjacency[atom].filter((other) => placed[other]).map((other) => angleOf(positions[atom], positions[other]));
      // Heavy branches first (they take the straightest directions), hydrogens last.
      unplaced.sort(
        (a, b) =>
          Number(graph.atoms[a].symbol === "H") - Number(graph.atoms[b].symbol === "H") ||
          branchWeight(atom, b) - branchWeight(atom, a) ||
          a - b,
      );
      const directions = childDirections(occupied, unplaced.length, domains[atom], turn[atom], systemOf[atom] >= 0);
      unplaced.forEach((child, k) => {
        const direction = directions[k];
        const at = { x: positions[atom].x + Math.cos(toRadians(direction)), y: positions[atom].y + Math.sin(toRadians(direction)) };
        const straight = occupied.length === 1 ? normalised(occupied[0] + 180) : direction;
        const relative = normalised(direction - straight);
        turn[child] = relative === 0 ? -turn[atom] || 1 : relative < 180 ? 1 : -1;
        if (systemOf[child] >= 0) queue.push(...placeSystem(systemOf[child], child, at, normalised(direction + 180)));
        else {
          positions[child] = at;
          placed[child] = 1;
          queue.push(child);
        }
      });
    }
    // Components sit side by side, left to right.
    let minX = Infinity;
    let maxX = -Infinity;
    for (const atom of component) {
      minX = Math.min(minX, positions[atom].x);
      maxX = Math.max(maxX, positions[atom].x);
    }
    for (const atom of component) positions[atom].x += offsetX - minX;
    offsetX += maxX - minX + 1.6;
  }

  repairCollisions(graph, positions, bridge, adjacency);
  return { positions };
}

/** Directions for `count` new neighbours of an atom whose placed neighbours lie at `occupied`. */
function childDirections(occupied: readonly number[], count: number, domainCount: number, turn: number, inRing: boolean): number[] {
  if (occupied.length === 0) {
    const total = Math.max(count, domainCount);
    if (total <= 1) return [0];
    if (total === 2) return [0, 180].slice(0, count);
    if (total === 4) return [0, 180, 90, 270].slice(0, count);
    return Array.from({ length: count }, (_, k) => (360 * k) / total);
  }
  if (occupied.length >= 2 || inRing) {
    const spread = spreadInGaps(occupied, count);
    // The straightest direction (furthest from every placed neighbour) goes to the heaviest branch.
    const clearance = (angle: number) => Math.min(...occupied.map((other) => angularDistance(angle, other)));
    return spread.sort((a, b) => clearance(b) - clearance(a));
  }
  const total = Math.max(domainCount, count + 1);
  const step = total <= 2 ? 180 : total === 3 ? 120 : total === 4 ? 90 : 360 / total;
  const straight = normalised(occupied[0] + 180);
  const candidates = Array.from({ length: total - 1 }, (_, k) => normalised(occupied[0] + step * (k + 1)));
  // Straight on first; of two equally straight, the one that turns against the last turn (a zigzag).
  const side = (angle: number) => (normalised(angle - straight) < 180 ? 1 : -1);
  candidates.sort(
    (a, b) => angularDistance(a, straight) - angularDistance(b, straight) || (side(a) === turn ? 1 : 0) - (side(b) === turn ? 1 : 0),
  );
  return candidates.slice(0, count);
}

/** Atoms reachable from `start` without stepping onto `blocked`. */
function reachableWithout(adjacency: readonly number[][], start: number, blocked: number): number {
  return reachedFrom(adjacency, start, blocked).size - 1;
}

function componentOf(adjacency: readonly number[][], start: number): number[] {
  return [...reachedFrom(adjacency, start)].sort((a, b) => a - b);
}

/** `start` and every atom reachable from it, with `blocked` (if given) counted as seen and never crossed. */
function reachedFrom(adjacency: readonly number[][], start: number, blocked?: number): Set<number> {
  const seen = new Set<number>(blocked === undefined ? [start] : [blocked, start]);
  const stack = [start];
  while (stack.length > 0) {
    const atom = stack.pop()!;
    for (const other of adjacency[atom]) {
      if (seen.has(other)) continue;
      seen.add(other);
      stack.push(other);
    }
  }
  return seen;
}

/** The largest ring system, or else the middle atom of the longest chain of heavy atoms. */
function chooseRoot(
  component: readonly number[],
  adjacency: readonly number[][],
  systemOf: Int32Array,
  rings: readonly number[][],
): number {
  let bestSystem = -1;
  let bestSize = 0;
  for (const ring of rings) {
    if (!component.includes(ring[0])) continue;
    const size = component.filter((atom) => systemOf[atom] === systemOf[ring[0]]).length;
    if (size > bestSize) {
      bestSize = size;
      bestSystem = systemOf[ring[0]];
    }
  }
  if (bestSystem >= 0) return component.find((atom) => systemOf[atom] === bestSystem)!;
  const farthest = (from: number): number[] => {
    const previous = new Map<number, number>([[from, -1]]);
    const queue = [from];
    for (let head = 0; head < queue.length; head++) {
      for (const other of adjacency[queue[head]]) {
        if (previous.has(other)) continue;
        previous.set(other, queue[head]);
        queue.push(other);
      }
    }
    const path: number[] = [];
    for (let atom = queue[queue.length - 1]; atom >= 0; atom = previous.get(atom)!) path.push(atom);
    return path;
  };
  const path = farthest(farthest(component[0])[0]);
  return path[Math.floor(path.length / 2)];
}

/** The smallest ring through each ring bond, each ring once, atoms in ring order. */
function smallestRings(graph: MolecularGraph, bridge: Uint8Array, ringAdjacency: readonly number[][]): number[][] {
  const rings: number[][] = [];
  const seen = new Set<string>();
  graph.bonds.forEach(({ from, to }, index) => {
    if (bridge[index] === 1 || from === to) return;
    const previous = new Map<number, number>([[from, -1]]);
    const queue = [from];
    for (let head = 0; head < queue.length && !previous.has(to); head++) {
      const atom = queue[head];
      for (const other of ringAdjacency[atom]) {
        if (previous.has(other) || (atom === from && other === to)) continue;
        previous.set(other, atom);
        queue.push(other);
      }
    }
    if (!previous.has(to)) return;
    const ring: number[] = [];
    for (let atom = to; atom >= 0; atom = previous.get(atom)!) ring.push(atom);
    const key = [...ring].sort((a, b) => a - b).join(",");
    if (seen.has(key)) return;
    seen.add(key);
    rings.push(ring);
  });
  return rings;
}

function ringSystems(atomCount: number, ringAdjacency: readonly number[][]): Int32Array {
  const systemOf = new Int32Array(atomCount).fill(-1);
  let next = 0;
  for (let start = 0; start < atomCount; start++) {
    if (systemOf[start] >= 0 || ringAdjacency[start].length === 0) continue;
    const stack = [start];
    systemOf[start] = next;
    while (stack.length > 0) {
      const atom = stack.pop()!;
      for (const other of ringAdjacency[atom]) {
        if (systemOf[other] >= 0) continue;
        systemOf[other] = next;
        stack.push(other);
      }
    }
    next++;
  }
  return systemOf;
}

/** Local coordinates of one ring system: the most fused ring first, then each ring on its placed atoms. */
function layoutRingSystem(rings: readonly number[][]): Map<number, Mutable> {
  const positions = new Map<number, Mutable>();
  const sharedCount = (ring: readonly number[]) =>
    ring.filter((atom) => rings.some((other) => other !== ring && other.includes(atom))).length;
  const remaining = [...rings].sort((a, b) => sharedCount(b) - sharedCount(a) || b.length - a.length);
  const placedRings: number[][] = [];
  const first = remaining.shift()!;
  const radius = 1 / (2 * Math.sin(Math.PI / first.length));
  first.forEach((atom, k) => {
    const angle = toRadians(-90 + 180 / first.length + (360 * k) / first.length);
    positions.set(atom, { x: radius * Math.cos(angle), y: radius * Math.sin(angle) });
  });
  placedRings.push(first);
  while (remaining.length > 0) {
    let bestIndex = 0;
    let bestPlaced = -1;
    remaining.forEach((ring, index) => {
      const count = ring.filter((atom) => positions.has(atom)).length;
      if (count > bestPlaced) {
        bestPlaced = count;
        bestIndex = index;
      }
    });
    const [ring] = remaining.splice(bestIndex, 1);
    if (bestPlaced === 0) placeLooseRing(ring, positions);
    else placeRingOnPlaced(ring, positions, placedRings);
    placedRings.push(ring);
  }
  return positions;
}

function placeLooseRing(ring: readonly number[], positions: Map<number, Mutable>): void {
  let maxX = 0;
  for (const point of positions.values()) maxX = Math.max(maxX, point.x);
  const radius = 1 / (2 * Math.sin(Math.PI / ring.length));
  ring.forEach((atom, k) => {
    const angle = toRadians((360 * k) / ring.length);
    positions.set(atom, { x: maxX + 1 + radius + radius * Math.cos(angle), y: radius * Math.sin(angle) });
  });
}

/** Places the unplaced runs of a ring as polygon arcs on the chord between their placed ends. */
function placeRingOnPlaced(ring: readonly number[], positions: Map<number, Mutable>, placedRings: readonly (readonly number[])[]): void {
  const size = ring.length;
  const start = ring.findIndex((atom) => positions.has(atom));
  for (let offset = 0; offset < size; offset++) {
    const index = (start + offset) % size;
    const next = ring[(index + 1) % size];
    if (!positions.has(ring[index]) || positions.has(next)) continue;
    const run: number[] = [];
    let end = (index + 1) % size;
    while (!positions.has(ring[end])) {
      run.push(ring[end]);
      end = (end + 1) % size;
    }
    const from = positions.get(ring[index])!;
    const to = positions.get(ring[end])!;
    if (ring[end] === ring[index]) placeSpiro(ring, index, positions);
    else placeArc(run, from, to, referenceCentre(ring[index], ring[end], positions, placedRings), positions);
  }
}

function referenceCentre(
  first: number,
  second: number,
  positions: Map<number, Mutable>,
  placedRings: readonly (readonly number[])[],
): Mutable {
  const holders = placedRings.filter((ring) => ring.includes(first) && ring.includes(second));
  const atoms = holders.length > 0 ? holders.flat() : [...positions.keys()];
  let x = 0;
  let y = 0;
  for (const atom of atoms) {
    x += positions.get(atom)!.x;
    y += positions.get(atom)!.y;
  }
  return { x: x / atoms.length, y: y / atoms.length };
}

function placeArc(run: readonly number[], from: Mutable, to: Mutable, away: Mutable, positions: Map<number, Mutable>): void {
  const vertices = run.length + 2;
  const chordX = to.x - from.x;
  const chordY = to.y - from.y;
  const chord = Math.hypot(chordX, chordY) || 1;
  const apothem = chord / (2 * Math.tan(Math.PI / vertices));
  let normalX = -chordY / chord;
  let normalY = chordX / chord;
  const middle = { x: (from.x + to.x) / 2, y: (from.y + to.y) / 2 };
  if (normalX * (away.x - middle.x) + normalY * (away.y - middle.y) > 0) {
    normalX = -normalX;
    normalY = -normalY;
  }
  const centre = { x: middle.x + normalX * apothem, y: middle.y + normalY * apothem };
  const step = 360 / vertices;
  const fromAngle = angleOf(centre, from);
  const toAngle = angleOf(centre, to);
  const sense = angularDistance(fromAngle - step, toAngle) < 1e-6 ? 1 : -1;
  const radius = chord / (2 * Math.sin(Math.PI / vertices));
  run.forEach((atom, k) => {
    const angle = toRadians(fromAngle + sense * step * (k + 1));
    positions.set(atom, { x: centre.x + radius * Math.cos(angle), y: centre.y + radius * Math.sin(angle) });
  });
}

/** A ring that shares only one atom with those drawn opens outwards from it. */
function placeSpiro(ring: readonly number[], sharedIndex: number, positions: Map<number, Mutable>): void {
  const shared = positions.get(ring[sharedIndex])!;
  let x = 0;
  let y = 0;
  for (const point of positions.values()) {
    x += point.x;
    y += point.y;
  }
  const count = positions.size;
  let outX = shared.x - x / count;
  let outY = shared.y - y / count;
  const length = Math.hypot(outX, outY) || 1;
  outX /= length;
  outY /= length;
  const radius = 1 / (2 * Math.sin(Math.PI / ring.length));
  const centre = { x: shared.x + outX * radius, y: shared.y + outY * radius };
  const base = angleOf(centre, shared);
  for (let k = 1; k < ring.length; k++) {
    const angle = toRadians(base + (360 * k) / ring.length);
    positions.set(ring[(sharedIndex + k) % ring.length], {
      x: centre.x + radius * Math.cos(angle),
      y: centre.y + radius * Math.sin(angle),
    });
  }
}

/** Penalty for two atoms this far apart (graded, so that easing a tight spot counts as progress). */
function closePenalty(distance: number): number {
  return distance < 0.8 ? 3 + 10 * (0.8 - distance) : 0;
}

function onBondPenalty(distance: number): number {
  return distance < 0.35 ? 2 + 10 * (0.35 - distance) : 0;
}

const CROSSING_PENALTY = 4;

/**
 * How badly a layout collides (crossing bonds, atoms on top of each other, atoms on bonds),
 * counting only the terms that involve a moved atom: the part of the score a move can change.
 */
function collisionsInvolving(graph: MolecularGraph, positions: readonly Mutable[], moved: readonly number[], isMoved: Uint8Array): number {
  const bonds = graph.bonds;
  let score = 0;
  for (const i of moved) {
    for (let j = 0; j < positions.length; j++) {
      if (j === i || (isMoved[j] && j < i)) continue;
      score += closePenalty(Math.hypot(positions[i].x - positions[j].x, positions[i].y - positions[j].y));
    }
  }
  const movedBonds: number[] = [];
  bonds.forEach((bond, index) => {
    if (isMoved[bond.from] || isMoved[bond.to]) movedBonds.push(index);
  });
  const bondMoved = (bond: { from: number; to: number }) => isMoved[bond.from] === 1 || isMoved[bond.to] === 1;
  for (const index of movedBonds) {
    const a = bonds[index];
    for (let other = 0; other < bonds.length; other++) {
      const b = bonds[other];
      if (other === index || (bondMoved(b) && other < index)) continue;
      if (a.from === b.from || a.from === b.to || a.to === b.from || a.to === b.to) continue;
      if (segmentsCross(positions[a.from], positions[a.to], positions[b.from], positions[b.to])) score += CROSSING_PENALTY;
    }
    // Atoms that did not move, against the bonds that did.
    for (let atom = 0; atom < positions.length; atom++) {
      if (isMoved[atom] || atom === a.from || atom === a.to) continue;
      score += onBondPenalty(distanceToSegment(positions[atom], positions[a.from], positions[a.to]));
    }
  }
  // Atoms that moved, against every bond.
  for (const atom of moved) {
    for (const bond of bonds) {
      if (bond.from === atom || bond.to === atom) continue;
      score += onBondPenalty(distanceToSegment(positions[atom], positions[bond.from], positions[bond.to]));
    }
  }
  return score;
}

function segmentsCross(p: Mutable, q: Mutable, r: Mutable, s: Mutable): boolean {
  const cross = (o: Mutable, a: Mutable, b: Mutable) => (a.x - o.x) * (b.y - o.y) - (a.y - o.y) * (b.x - o.x);
  const d1 = cross(r, s, p);
  const d2 = cross(r, s, q);
  const d3 = cross(p, q, r);
  const d4 = cross(p, q, s);
  return ((d1 > 1e-9 && d2 < -1e-9) || (d1 < -1e-9 && d2 > 1e-9)) && ((d3 > 1e-9 && d4 < -1e-9) || (d3 < -1e-9 && d4 > 1e-9));
}

function distanceToSegment(point: Mutable, from: Mutable, to: Mutable): number {
  const dx = to.x - from.x;
  const dy = to.y - from.y;
  const lengthSquared = dx * dx + dy * dy || 1;
  const t = Math.max(0, Math.min(1, ((point.x - from.x) * dx + (point.y - from.y) * dy) / lengthSquared));
  return Math.hypot(point.x - (from.x + t * dx), point.y - (from.y + t * dy));
}

type Move = "mirror" | number;
const MOVES: readonly Move[] = ["mirror", 30, -30, 60, -60, 90, -90];

/** Mirrors or turns the smaller side of chain bonds while that lowers the collision score. */
function repairCollisions(graph: MolecularGraph, positions: Mutable[], bridge: Uint8Array, adjacency: readonly number[][]): void {
  const everyAtom = positions.map((_, index) => index);
  if (collisionsInvolving(graph, positions, everyAtom, new Uint8Array(positions.length).fill(1)) === 0) return;
  const sides: { pivot: number; far: number; atoms: number[]; isMoved: Uint8Array }[] = [];
  graph.bonds.forEach(({ from, to }, index) => {
    if (bridge[index] !== 1) return;
    const beyondTo = sideOf(adjacency, to, from);
    const smallerIsTo = beyondTo.length <= graph.atoms.length / 2;
    const atoms = smallerIsTo ? beyondTo : sideOf(adjacency, from, to);
    const isMoved = new Uint8Array(positions.length);
    for (const atom of atoms) isMoved[atom] = 1;
    sides.push({ pivot: smallerIsTo ? from : to, far: smallerIsTo ? to : from, atoms, isMoved });
  });
  const saved: Mutable[] = positions.map(() => ({ x: 0, y: 0 }));
  for (let pass = 0; pass < MAX_REPAIR_PASSES; pass++) {
    let bestGain = 1e-6;
    let bestSide = -1;
    let bestMove: Move = "mirror";
    sides.forEach((side, sideIndex) => {
      const before = collisionsInvolving(graph, positions, side.atoms, side.isMoved);
      if (before === 0) return;
      for (const atom of side.atoms) saved[atom] = positions[atom];
      for (const move of MOVES) {
        applyMove(positions, side, move, saved);
        const gain = before - collisionsInvolving(graph, positions, side.atoms, side.isMoved);
        if (gain > bestGain) {
          bestGain = gain;
          bestSide = sideIndex;
          bestMove = move;
        }
      }
      for (const atom of side.atoms) positions[atom] = saved[atom];
    });
    if (bestSide < 0) return;
    const side = sides[bestSide];
    for (const atom of side.atoms) saved[atom] = positions[atom];
    applyMove(positions, side, bestMove, saved);
  }
}

/** Moves one side from its saved places (the pivot and far atoms of the bond never move off its line). */
function applyMove(
  positions: Mutable[],
  side: { pivot: number; far: number; atoms: number[] },
  move: Move,
  saved: readonly Mutable[],
): void {
  const pivot = positions[side.pivot];
  const axisEnd = saved[side.far];
  for (const atom of side.atoms) {
    positions[atom] = move === "mirror" ? mirrored(saved[atom], pivot, axisEnd) : turned(saved[atom], pivot, move);
  }
}

function sideOf(adjacency: readonly number[][], start: number, blocked: number): number[] {
  const seen = new Set<number>([blocked, start]);
  const stack = [start];
  const atoms = [start];
  while (stack.length > 0) {
    const atom = stack.pop()!;
    for (const other of adjacency[atom]) {
      if (seen.has(other)) continue;
      seen.add(other);
      stack.push(other);
      atoms.push(other);
    }
  }
  return atoms;
}

function mirrored(point: Mutable, lineFrom: Mutable, lineTo: Mutable): Mutable {
  const dx = lineTo.x - lineFrom.x;
  const dy = lineTo.y - lineFrom.y;
  const lengthSquared = dx * dx + dy * dy || 1;
  const t = ((point.x - lineFrom.x) * dx + (point.y - lineFrom.y) * dy) / lengthSquared;
  const footX = lineFrom.x + t * dx;
  const footY = lineFrom.y + t * dy;
  return { x: 2 * footX - point.x, y: 2 * footY - point.y };
}

function turned(point: Mutable, pivot: Mutable, degrees: number): Mutable {
  const cos = Math.cos(toRadians(degrees));
  const sin = Math.sin(toRadians(degrees));
  const dx = point.x - pivot.x;
  const dy = point.y - pivot.y;
  return { x: pivot.x + dx * cos - dy * sin, y: pivot.y + dx * sin + dy * cos };
}
