/**
 * Unit vectors pointing at every site (bond or lone pair) of each VSEPR electron geometry,
 * in a fixed order that the Lewis/VSEPR code relies on when it places lone pairs.
 */
import type { ElectronGeometry } from "../types";
import type { Vec3 } from "./vectors";

/** Whether a site is axial, equatorial, or one of a set of equivalent sites. */
export type SiteKind = "axial" | "equatorial" | "any";

const TETRAHEDRAL_POLAR_ANGLE = Math.acos(-1 / 3);

function freezeAll(directions: readonly Vec3[]): readonly Vec3[] {
  return Object.freeze(directions.map((direction) => Object.freeze([...direction]) as Vec3));
}

/** Point on the unit sphere from a polar angle (from +z) and an azimuth (from +x), in radians. */
function spherical(polar: number, azimuth: number): Vec3 {
  // Rounding keeps exact zeros exact, so 90° sites do not carry 1e-17 noise.
  const clean = (value: number) => (Math.abs(value) < 1e-15 ? 0 : value);
  return [clean(Math.sin(polar) * Math.cos(azimuth)), clean(Math.sin(polar) * Math.sin(azimuth)), clean(Math.cos(polar))];
}

/** `count` sites evenly spaced round the xy plane, the first along +x. */
function equatorialRing(count: number): Vec3[] {
  return Array.from({ length: count }, (_, k) => spherical(Math.PI / 2, (2 * Math.PI * k) / count));
}

const DIRECTIONS: Readonly<Record<ElectronGeometry, readonly Vec3[]>> = Object.freeze({
  linear: freezeAll([
    [0, 0, 1],
    [0, 0, -1],
  ]),
  "trigonal planar": freezeAll(equatorialRing(3)),
  tetrahedral: freezeAll([[0, 0, 1], ...[0, 1, 2].map((k) => spherical(TETRAHEDRAL_POLAR_ANGLE, (2 * Math.PI * k) / 3))]),
  "trigonal bipyramidal": freezeAll([[0, 0, 1], [0, 0, -1], ...equatorialRing(3)]),
  octahedral: freezeAll([
    [0, 0, 1],
    [0, 0, -1],
    [1, 0, 0],
    [-1, 0, 0],
    [0, 1, 0],
    [0, -1, 0],
  ]),
  "pentagonal bipyramidal": freezeAll([[0, 0, 1], [0, 0, -1], ...equatorialRing(5)]),
});

/**
 * Unit vectors for every site of an electron geometry, in this order:
 *
 * - linear (2): +z, -z.
 * - trigonal planar (3): in the xy plane at 0°, 120°, 240° from +x.
 * - tetrahedral (4): +z, then three sites 109.47° from it at azimuths 0°, 120°, 240°; so a
 *   lone pair on site 0 leaves a pyramid with its axis along z.
 * - trigonal bipyramidal (5): sites 0 and 1 axial (+z, -z); sites 2, 3, 4 equatorial in the xy
 *   plane. Lone pairs go on equatorial sites first (2, then 3, then 4).
 * - octahedral (6): +z, -z, +x, -x, +y, -y, so trans pairs are consecutive (0/1, 2/3, 4/5).
 *   Lone pairs go on site 0, then its trans partner 1 (square planar), then 2 and 3.
 * - pentagonal bipyramidal (7): sites 0 and 1 axial (+z, -z); sites 2-6 equatorial in the xy
 *   plane at 72° steps. Lone pairs go on axial sites first (0, then 1).
 *
 * {@link lonePairSiteOrder} gives the same preference as data.
 */
export function idealDirections(electronGeometry: ElectronGeometry): readonly Vec3[] {
  return DIRECTIONS[electronGeometry];
}

/** Indices of the axial sites of each electron geometry; empty where all sites are alike. */
export const AXIAL_SITES: Readonly<Record<ElectronGeometry, readonly number[]>> = Object.freeze({
  linear: Object.freeze([]),
  "trigonal planar": Object.freeze([]),
  tetrahedral: Object.freeze([]),
  "trigonal bipyramidal": Object.freeze([0, 1]),
  octahedral: Object.freeze([]),
  "pentagonal bipyramidal": Object.freeze([0, 1]),
});

/**
 * Whether a site of an electron geometry is axial or equatorial. Geometries whose sites are all
 * equivalent (linear, trigonal planar, tetrahedral, octahedral) answer "any".
 */
export function siteKind(electronGeometry: ElectronGeometry, index: number): SiteKind {
  if (electronGeometry !== "trigonal bipyramidal" && electronGeometry !== "pentagonal bipyramidal") {
    return "any";
  }
  return AXIAL_SITES[electronGeometry].includes(index) ? "axial" : "equatorial";
}

const LONE_PAIR_SITE_ORDER: Readonly<Record<ElectronGeometry, readonly number[]>> = Object.freeze({
  linear: Object.freeze([0, 1]),
  "trigonal planar": Object.freeze([0, 1, 2]),
  tetrahedral: Object.freeze([0, 1, 2, 3]),
  // Equatorial first: a lone pair there has only two neighbours at 90°, not three.
  "trigonal bipyramidal": Object.freeze([2, 3, 4, 0, 1]),
  // Trans pairs first: two lone pairs opposite each other keep 180° apart (square planar).
  octahedral: Object.freeze([0, 1, 2, 3, 4, 5]),
  // Axial first: the pentagonal planar shape puts both lone pairs on the axis.
  "pentagonal bipyramidal": Object.freeze([0, 1, 2, 3, 4, 5, 6]),
});

/**
 * Site indices in the order lone pairs should fill them: the first `lonePairs` entries hold lone
 * pairs and the rest hold bonds.
 */
export function lonePairSiteOrder(electronGeometry: ElectronGeometry): readonly number[] {
  return LONE_PAIR_SITE_ORDER[electronGeometry];
}
