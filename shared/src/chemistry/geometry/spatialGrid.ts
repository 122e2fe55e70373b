/**
 * Atoms bucketed by position in cubes of a fixed edge, so that "which placed atoms lie within r
 * of this point" costs the atoms nearby instead of every atom placed: what keeps the walk and the
 * contact checks of a long chain linear in its atoms.
 */
import type { Vec3 } from "./vectors";

export interface SpatialGrid {
  /** Files `atom` at `position`. */
  add(atom: number, position: Vec3): void;
  /** Atoms filed within `radius` of `point`, in increasing index order (so sums keep one order). */
  near(point: Vec3, radius: number): number[];
  /** Forgets every atom. */
  clear(): void;
}

/** Cells per axis either side of the origin that get keys of their own; farther cells share the edge cell. */
const HALF_RANGE = 1 << 16;

/** A grid of cubes with edge `cell` ångströms. */
export function createSpatialGrid(cell: number): SpatialGrid {
  const cells = new Map<number, number[]>();
  const positions = new Map<number, Vec3>();
  const index = (value: number): number => Math.max(-HALF_RANGE, Math.min(HALF_RANGE - 1, Math.floor(value / cell)));
  // Three indices of 17 bits each fit exactly in a double.
  const key = (x: number, y: number, z: number): number =>
    ((x + HALF_RANGE) * 2 * HALF_RANGE + (y + HALF_RANGE)) * 2 * HALF_RANGE + (z + HALF_RANGE);
  return {
    add(atom, position) {
      positions.set(atom, position);
      const cellKey = key(index(position[0]), index(position[1]), index(position[2]));
      const list = cells.get(cellKey);
      if (list) list.push(atom);
      else cells.set(cellKey, [atom]);
    },
    near(point, radius) {
      const found: number[] = [];
      const squared = radius * radius;
      const [x0, x1] = [index(point[0] - radius), index(point[0] + radius)];
      const [y0, y1] = [index(point[1] - radius), index(point[1] + radius)];
      const [z0, z1] = [index(point[2] - radius), index(point[2] + radius)];
      for (let x = x0; x <= x1; x++) {
        for (let y = y0; y <= y1; y++) {
          for (let z = z0; z <= z1; z++) {
            for (const atom of cells.get(key(x, y, z)) ?? []) {
              const p = positions.get(atom)!;
              const dx = p[0] - point[0];
              const dy = p[1] - point[1];
              const dz = p[2] - point[2];
              if (dx * dx + dy * dy + dz * dz <= squared) found.push(atom);
            }
          }
        }
      }
      return found.sort((a, b) => a - b);
    },
    clear() {
      cells.clear();
      positions.clear();
    },
  };
}
