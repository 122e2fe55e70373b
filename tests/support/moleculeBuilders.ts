/**
 * Builders of idealised 3D coordinates for symmetry tests: VSEPR centres from the ideal site
 * directions, and a few multi-centre frameworks (ethane, ethylene, rings, cages) built by hand.
 * Bond lengths are rounded textbook values in ångströms; symmetry does not depend on them.
 */
import { idealDirections, lonePairSiteOrder } from "../../shared/src/chemistry/geometry/idealDirections";
import { add, cross, normalize, scale, type Vec3 } from "../../shared/src/chemistry/geometry/vectors";
import type { ElectronGeometry } from "../../shared/src/chemistry/types";

export interface Atom {
  readonly element: string;
  readonly position: Vec3;
}

const degrees = (value: number) => (value * Math.PI) / 180;

/** Ligand element and bond length. */
export type Ligand = readonly [string, number];

/**
 * A VSEPR centre: lone pairs take the first `lonePairs` sites of the preferred order, and the
 * ligands fill the remaining sites in ascending site index.
 */
export function vseprCentre(centre: string, geometry: ElectronGeometry, lonePairs: number, ligands: readonly Ligand[]): Atom[] {
  const taken = new Set(lonePairSiteOrder(geometry).slice(0, lonePairs));
  const freeSites = idealDirections(geometry)
    .map((direction, index) => ({ direction, index }))
    .filter(({ index }) => !taken.has(index));
  if (freeSites.length !== ligands.length) throw new Error(`${centre}: ${ligands.length} ligands for ${freeSites.length} sites`);
  return [
    { element: centre, position: [0, 0, 0] },
    ...ligands.map(([element, length], k) => ({ element, position: scale(freeSites[k].direction, length) })),
  ];
}

/** A centre with ligands on chosen sites of an electron geometry. */
export function onSites(centre: string, geometry: ElectronGeometry, ligands: Readonly<Record<number, Ligand>>): Atom[] {
  const directions = idealDirections(geometry);
  return [
    { element: centre, position: [0, 0, 0] },
    ...Object.entries(ligands).map(([site, [element, length]]) => ({
      element,
      position: scale(directions[Number(site)], length),
    })),
  ];
}

/** A bent triatomic A-X-B with the given angle at X. */
export function bent(centre: string, first: Ligand, second: Ligand, angleDegrees: number): Atom[] {
  const half = degrees(angleDegrees) / 2;
  return [
    { element: centre, position: [0, 0, 0] },
    { element: first[0], position: [first[1] * Math.sin(half), 0, first[1] * Math.cos(half)] },
    { element: second[0], position: [-second[1] * Math.sin(half), 0, second[1] * Math.cos(half)] },
  ];
}

/** Atoms along the z axis at the given separations, in order. */
export function chain(elements: readonly string[], separations: readonly number[]): Atom[] {
  let z = 0;
  return elements.map((element, index) => {
    if (index > 0) z += separations[index - 1];
    return { element, position: [0, 0, z] };
  });
}

/**
 * X-Y(-a)...Y(-b)-X: two atoms Y on the x axis, each with one substituent making `angle` with the
 * Y-Y bond, the second turned by `dihedral` about the Y-Y axis (H2O2, N2F2).
 */
export function twistedPair(
  bridge: string,
  bridgeLength: number,
  substituent: Ligand,
  angleDegrees: number,
  dihedralDegrees: number,
): Atom[] {
  const half = bridgeLength / 2;
  const [element, length] = substituent;
  const alpha = degrees(angleDegrees);
  const phi = degrees(dihedralDegrees);
  return [
    { element: bridge, position: [-half, 0, 0] },
    { element: bridge, position: [half, 0, 0] },
    { element, position: [-half + length * Math.cos(alpha), length * Math.sin(alpha), 0] },
    {
      element,
      position: [half - length * Math.cos(alpha), length * Math.sin(alpha) * Math.cos(phi), length * Math.sin(alpha) * Math.sin(phi)],
    },
  ];
}

/**
 * Ethane-like X3A-BY3 along z: substituents at the tetrahedral angle, the second set turned by
 * `twistDegrees` (60 staggered, 0 eclipsed).
 */
export function ethaneLike(
  front: string,
  back: string,
  frontSubstituents: readonly Ligand[],
  backSubstituents: readonly Ligand[],
  twistDegrees: number,
  bridgeLength = 1.535,
): Atom[] {
  const polar = degrees(180 - 109.47);
  const atoms: Atom[] = [
    { element: front, position: [0, 0, bridgeLength / 2] },
    { element: back, position: [0, 0, -bridgeLength / 2] },
  ];
  frontSubstituents.forEach(([element, length], k) => {
    const azimuth = degrees(120 * k);
    atoms.push({
      element,
      position: [
        length * Math.sin(polar) * Math.cos(azimuth),
        length * Math.sin(polar) * Math.sin(azimuth),
        bridgeLength / 2 + length * Math.cos(polar),
      ],
    });
  });
  backSubstituents.forEach(([element, length], k) => {
    const azimuth = degrees(120 * k + twistDegrees);
    atoms.push({
      element,
      position: [
        length * Math.sin(polar) * Math.cos(azimuth),
        length * Math.sin(polar) * Math.sin(azimuth),
        -bridgeLength / 2 - length * Math.cos(polar),
      ],
    });
  });
  return atoms;
}

/**
 * Ethylene-like planar A=A along x with two substituents on each end at 120°: [upper, lower] on
 * the left carbon, then [upper, lower] on the right. `twistDegrees` turns the right end about x.
 */
export function ethyleneLike(
  left: readonly [Ligand, Ligand],
  right: readonly [Ligand, Ligand],
  twistDegrees = 0,
  doubleBond = 1.339,
): Atom[] {
  const half = doubleBond / 2;
  const twist = degrees(twistDegrees);
  const place = (x: number, ligand: Ligand, angle: number, turned: boolean): Atom => {
    const dx = ligand[1] * Math.cos(degrees(angle));
    const dy = ligand[1] * Math.sin(degrees(angle));
    const [y, z] = turned ? [dy * Math.cos(twist), dy * Math.sin(twist)] : [dy, 0];
    return { element: ligand[0], position: [x + dx, y, z] };
  };
  return [
    { element: "C", position: [-half, 0, 0] },
    { element: "C", position: [half, 0, 0] },
    place(-half, left[0], 120, false),
    place(-half, left[1], 240, false),
    place(half, right[0], 60, true),
    place(half, right[1], 300, true),
  ];
}

/** A planar six-membered ring of C in the xy plane with one substituent per carbon, radially. */
export function benzeneLike(substituents: readonly Ligand[], ringRadius = 1.397): Atom[] {
  const atoms: Atom[] = [];
  substituents.forEach(([element, length], k) => {
    const angle = degrees(60 * k);
    const outward: Vec3 = [Math.cos(angle), Math.sin(angle), 0];
    atoms.push({ element: "C", position: scale(outward, ringRadius) });
    atoms.push({ element, position: scale(outward, ringRadius + length) });
  });
  return atoms;
}

/** Cyclohexane chair: carbons alternately above and below the mean plane, axial and equatorial H. */
export function cyclohexaneChair(): Atom[] {
  const radius = 1.45;
  const pucker = 0.25;
  const bond = 1.09;
  const tilt = degrees(19);
  const atoms: Atom[] = [];
  for (let k = 0; k < 6; k++) {
    const angle = degrees(60 * k);
    const side = k % 2 === 0 ? 1 : -1;
    const carbon: Vec3 = [radius * Math.cos(angle), radius * Math.sin(angle), side * pucker];
    atoms.push({ element: "C", position: carbon });
    atoms.push({ element: "H", position: add(carbon, [0, 0, side * bond]) });
    atoms.push({
      element: "H",
      position: add(carbon, [
        bond * Math.cos(tilt) * Math.cos(angle),
        bond * Math.cos(tilt) * Math.sin(angle),
        -side * bond * Math.sin(tilt),
      ]),
    });
  }
  return atoms;
}

/** A crown ring of `count` atoms alternately above and below the xy plane (S8 when count is 8). */
export function crownRing(element: string, count: number, radius: number, pucker: number): Atom[] {
  return Array.from({ length: count }, (_, k) => {
    const angle = degrees((360 * k) / count);
    return { element, position: [radius * Math.cos(angle), radius * Math.sin(angle), k % 2 === 0 ? pucker : -pucker] as Vec3 };
  });
}

/** Allene H2C=C=CH2 along z, the two CH2 planes at right angles. */
export function allene(): Atom[] {
  const cc = 1.308;
  const ch = 1.087;
  const half = degrees(118.2 / 2);
  const endZ = cc + ch * Math.cos(half);
  const sideways = ch * Math.sin(half);
  return [
    { element: "C", position: [0, 0, 0] },
    { element: "C", position: [0, 0, cc] },
    { element: "C", position: [0, 0, -cc] },
    { element: "H", position: [sideways, 0, endZ] },
    { element: "H", position: [-sideways, 0, endZ] },
    { element: "H", position: [0, sideways, -endZ] },
    { element: "H", position: [0, -sideways, -endZ] },
  ];
}

/** Diborane: B-B along x, terminal H in the xy plane, bridging H above and below on z. */
export function diborane(): Atom[] {
  const halfBB = 1.763 / 2;
  const terminal = 1.19;
  const half = degrees(121.5 / 2);
  const atoms: Atom[] = [
    { element: "B", position: [-halfBB, 0, 0] },
    { element: "B", position: [halfBB, 0, 0] },
    { element: "H", position: [0, 0, 0.99] },
    { element: "H", position: [0, 0, -0.99] },
  ];
  for (const sx of [-1, 1]) {
    for (const sy of [-1, 1]) {
      atoms.push({ element: "H", position: [sx * (halfBB + terminal * Math.cos(half)), sy * terminal * Math.sin(half), 0] });
    }
  }
  return atoms;
}

/** Cubane: C8 at the corners of a cube, each H pointing out along the body diagonal. */
export function cubane(): Atom[] {
  const atoms: Atom[] = [];
  for (const x of [-1, 1])
    for (const y of [-1, 1])
      for (const z of [-1, 1]) {
        const corner: Vec3 = [x, y, z];
        atoms.push({ element: "C", position: scale(corner, 0.787) });
        atoms.push({ element: "H", position: scale(corner, 0.787 + 1.09 / Math.sqrt(3)) });
      }
  return atoms;
}

/** closo-B12H12(2-): B12 icosahedron with one radial H on each boron. */
export function dodecahydroDodecaborate(): Atom[] {
  const golden = (1 + Math.sqrt(5)) / 2;
  const vertices: Vec3[] = [];
  for (const a of [-1, 1])
    for (const b of [-1, 1]) {
      vertices.push([0, a, b * golden], [a, b * golden, 0], [b * golden, 0, a]);
    }
  return vertices.flatMap((vertex) => {
    const unit = normalize(vertex);
    return [
      { element: "B", position: scale(unit, 1.7) },
      { element: "H", position: scale(unit, 1.7 + 1.2) },
    ];
  });
}

/**
 * An idealised hexanitro complex M(NO2)6: nitro planes along x in xy, along y in yz, along z in
 * zx, so the threefold axes survive but the fourfold ones do not.
 */
export function hexanitroComplex(): Atom[] {
  const mn = 1.95;
  const no = 1.24;
  const half = degrees(118 / 2);
  const atoms: Atom[] = [{ element: "Co", position: [0, 0, 0] }];
  const frames: readonly [Vec3, Vec3][] = [
    [
      [1, 0, 0],
      [0, 1, 0],
    ],
    [
      [0, 1, 0],
      [0, 0, 1],
    ],
    [
      [0, 0, 1],
      [1, 0, 0],
    ],
  ];
  for (const [axis, inPlane] of frames) {
    for (const sign of [1, -1]) {
      const out = scale(axis, sign);
      const nitrogen = scale(out, mn);
      atoms.push({ element: "N", position: nitrogen });
      for (const side of [1, -1]) {
        atoms.push({
          element: "O",
          position: add(nitrogen, add(scale(out, no * Math.cos(half)), scale(inPlane, side * no * Math.sin(half)))),
        });
      }
    }
  }
  return atoms;
}

/** Boric acid B(OH)3, planar, every O-H turned the same way round the ring. */
export function boricAcid(): Atom[] {
  const atoms: Atom[] = [{ element: "B", position: [0, 0, 0] }];
  for (let k = 0; k < 3; k++) {
    const angle = degrees(120 * k);
    const oxygen: Vec3 = [1.36 * Math.cos(angle), 1.36 * Math.sin(angle), 0];
    const hAngle = angle + degrees(180 - 114);
    atoms.push({ element: "O", position: oxygen });
    atoms.push({ element: "H", position: add(oxygen, [0.97 * Math.cos(hAngle), 0.97 * Math.sin(hAngle), 0]) });
  }
  return atoms;
}

/**
 * C(OH)4 with every O-H turned the same way about the S4 axis (z): the four O and four H are each
 * one orbit of S4 = rotate 90° about z, then reflect through the xy plane.
 */
export function orthocarbonicAcidS4(): Atom[] {
  const s4 = ([x, y, z]: Vec3): Vec3 => [-y, x, -z];
  let oxygen: Vec3 = scale(normalize([1, 1, 1]), 1.39);
  const bondDirection = normalize(oxygen);
  // A generic O-H direction at about 108° from C-O, turned off every mirror plane.
  const sideways = normalize(cross(bondDirection, [0.3, -0.8, 0.5]));
  let hydrogen: Vec3 = add(oxygen, scale(normalize(add(scale(bondDirection, 0.31), sideways)), 0.96));
  const atoms: Atom[] = [{ element: "C", position: [0, 0, 0] }];
  for (let k = 0; k < 4; k++) {
    atoms.push({ element: "O", position: oxygen }, { element: "H", position: hydrogen });
    oxygen = s4(oxygen);
    hydrogen = s4(hydrogen);
  }
  return atoms;
}
