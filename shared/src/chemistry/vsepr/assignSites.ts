/**
 * Which site of the electron geometry each lone pair and each neighbour takes. Lone pairs take
 * the roomiest sites (equatorial in a trigonal bipyramid, trans to each other in an octahedron,
 * axial in a pentagonal bipyramid). In a trigonal bipyramid, multiply bonded and less
 * electronegative neighbours go equatorial and the most electronegative go axial; elsewhere like
 * neighbours are placed trans to each other where possible, the most symmetric arrangement.
 */
import { idealDirections, lonePairSiteOrder, siteKind, type SiteKind } from "../geometry/idealDirections";
import type { Vec3 } from "../geometry/vectors";
import type { ElectronGeometry } from "../types";
import { sortSmall } from "../sortSmall";

export interface Ligand {
  readonly atom: number;
  readonly symbol: string;
  readonly electronegativity: number;
  readonly bondOrder: number;
}

export interface SiteAssignment {
  /** Direction of each ligand, parallel to the ligands given. */
  readonly ligandDirections: readonly Vec3[];
  readonly ligandSiteKinds: readonly SiteKind[];
  readonly lonePairDirections: readonly Vec3[];
}

export function assignSites(electronGeometry: ElectronGeometry, loneDomains: number, ligands: readonly Ligand[]): SiteAssignment {
  const directions = idealDirections(electronGeometry);
  const siteOrder = lonePairSiteOrder(electronGeometry);
  const loneSites = siteOrder.slice(0, loneDomains);
  let freeSites = siteOrder.slice(loneDomains);

  const order = new Array<number>(ligands.length);
  for (let k = 0; k < ligands.length; k++) order[k] = k;
  if (electronGeometry === "trigonal bipyramidal") {
    // Equatorial sites are listed first among the free ones: give them the bulky bonds.
    freeSites = sortSmall(
      [...freeSites],
      (a, b) => Number(siteKind(electronGeometry, a) === "axial") - Number(siteKind(electronGeometry, b) === "axial"),
    );
    sortSmall(
      order,
      (a, b) => ligands[b].bondOrder - ligands[a].bondOrder || ligands[a].electronegativity - ligands[b].electronegativity || a - b,
    );
  } else {
    // Rarest neighbours first, so a single odd one out lands trans to a lone pair (XeOF4) and
    // like neighbours fill trans pairs together.
    const keys = ligands.map((ligand) => `${ligand.symbol}${ligand.bondOrder}`);
    const counts = new Map<string, number>();
    for (const key of keys) counts.set(key, (counts.get(key) ?? 0) + 1);
    sortSmall(
      order,
      (a, b) => counts.get(keys[a])! - counts.get(keys[b])! || (keys[a] < keys[b] ? -1 : keys[a] > keys[b] ? 1 : 0) || a - b,
    );
  }

  const ligandDirections = new Array<Vec3>(ligands.length);
  const ligandSiteKinds = new Array<SiteKind>(ligands.length);
  order.forEach((ligandIndex, k) => {
    const site = freeSites[k];
    ligandDirections[ligandIndex] = directions[site];
    ligandSiteKinds[ligandIndex] = siteKind(electronGeometry, site);
  });
  return {
    ligandDirections,
    ligandSiteKinds,
    lonePairDirections: loneSites.map((site) => directions[site]),
  };
}
