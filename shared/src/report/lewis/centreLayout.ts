/**
 * The layout of a species with one centre and only outer atoms round it, drawn the way chemists
 * draw it on paper: each site of the VSEPR electron geometry gets a fixed direction in the plane,
 * chosen per number of lone domains so that the molecular shape stays recognisable (the seesaw
 * stands on its two equatorial legs, the T stands upright, the square plane faces the reader, the
 * octahedron shows its two perspective bonds on a diagonal). Which neighbour takes which site is
 * the core's own VSEPR assignment, so axial and equatorial atoms land where they belong.
 */
import { atomSites } from "../../chemistry/geometry/atomSites";
import { idealDirections } from "../../chemistry/geometry/idealDirections";
import type { Vec3 } from "../../chemistry/geometry/vectors";
import type { ElectronGeometry, MolecularGraph } from "../../chemistry/types";
import type { DiagramLayout, Point } from "./layoutTypes";

/**
 * Plane directions (degrees, y up) for each site index of an electron geometry (the order of
 * `idealDirections`), keyed by the number of lone domains, which fill sites in the core's order.
 */
const SITE_ANGLES: Readonly<Record<ElectronGeometry, Readonly<Record<number, readonly number[]>>>> = {
  // +z, -z
  linear: { 0: [180, 0] },
  // azimuth 0, 120, 240; a lone pair takes site 0, drawn on top of a bent molecule
  "trigonal planar": { 0: [90, 210, 330], 1: [90, 210, 330] },
  // +z, then three round it; the usual cross, or a bent molecule under its two lone pairs
  tetrahedral: { 0: [90, 180, 270, 0], 1: [90, 180, 270, 0], 2: [60, 120, 210, 330] },
  // axial +z, -z; equatorial at azimuth 0, 120, 240 (lone pairs take 2, then 3, then 4)
  "trigonal bipyramidal": {
    0: [90, 270, 180, 30, 330],
    1: [180, 0, 90, 240, 300],
    2: [180, 0, 60, 120, 270],
    3: [180, 0, 90, 230, 310],
  },
  // +z, -z, +x, -x, +y, -y (lone pairs take 0, 1, 2, 3 in turn)
  octahedral: {
    0: [90, 270, 0, 180, 45, 225],
    1: [270, 90, 20, 200, 160, 340],
    2: [45, 225, 0, 180, 90, 270],
    3: [45, 135, 90, 270, 180, 0],
    4: [60, 240, 120, 300, 180, 0],
  },
  // axial +z, -z; equatorial at azimuth 0, 72, 144, 216, 288 (lone pairs take the axial sites)
  "pentagonal bipyramidal": {
    0: [90, 270, 0, 50, 160, 200, 310],
    1: [270, 90, 0, 50, 160, 200, 310],
    2: [126, 342, 90, 162, 234, 306, 18],
  },
};

/** Index of the ideal site a local direction points at, or -1 when none is close. */
function siteIndexOf(direction: Vec3, sites: readonly Vec3[]): number {
  let best = -1;
  let bestDot = 0.98;
  sites.forEach((site, index) => {
    const dot = site[0] * direction[0] + site[1] * direction[1] + site[2] * direction[2];
    if (dot > bestDot) {
      best = index;
      bestDot = dot;
    }
  });
  return best;
}

/**
 * The layout of a one-centre species, or undefined when the centre's sites do not match its
 * electron geometry's table (the caller then lays it out as any other molecule).
 */
export function centreLayout(
  graph: MolecularGraph,
  centre: number,
  electronGeometry: ElectronGeometry,
  radical: boolean,
): DiagramLayout | undefined {
  const sites = atomSites(graph, centre, radical);
  const angles = SITE_ANGLES[electronGeometry]?.[sites.loneDomains.length];
  if (!angles) return undefined;
  const ideal = idealDirections(electronGeometry);
  const positions: Point[] = graph.atoms.map(() => ({ x: 0, y: 0 }));
  const used = new Set<number>();
  for (const ligand of sites.ligands) {
    const site = siteIndexOf(ligand.direction, ideal);
    if (site < 0 || used.has(site)) return undefined;
    used.add(site);
    const radians = (angles[site] * Math.PI) / 180;
    positions[ligand.atom] = { x: Math.cos(radians), y: Math.sin(radians) };
  }
  const centreLoneAngles: number[] = [];
  for (const domain of sites.loneDomains) {
    const site = siteIndexOf(domain.direction, ideal);
    if (site < 0 || used.has(site)) return undefined;
    used.add(site);
    centreLoneAngles.push(angles[site]);
  }
  // Every neighbour must have found a site, or some atom would sit on the centre.
  if (used.size !== sites.ligands.length + sites.loneDomains.length || sites.ligands.length !== graph.atoms.length - 1) {
    return undefined;
  }
  const loneAngles: (readonly number[] | undefined)[] = graph.atoms.map(() => undefined);
  loneAngles[centre] = centreLoneAngles;
  return { positions, loneAngles };
}
