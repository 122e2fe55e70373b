import { describe, expect, it } from "vitest";
import { AXIAL_SITES, idealDirections, lonePairSiteOrder, siteKind } from "../shared/src/chemistry/geometry/idealDirections";
import { add, angleDegrees, cross, dot, norm, normalize, scale, sub, type Vec3 } from "../shared/src/chemistry/geometry/vectors";
import type { ElectronGeometry } from "../shared/src/chemistry/types";

const distinctAngles = (directions: readonly Vec3[]): number[] => {
  const angles = new Set<number>();
  for (let i = 0; i < directions.length; i++) {
    for (let j = i + 1; j < directions.length; j++) angles.add(Math.round(angleDegrees(directions[i], directions[j]) * 100) / 100);
  }
  return [...angles].sort((a, b) => a - b);
};

describe("vector helpers", () => {
  // common practice: right-handed axes, x × y = z
  it("cross follows the right-hand rule", () => {
    expect(cross([1, 0, 0], [0, 1, 0])).toEqual([0, 0, 1]);
    expect(cross([0, 1, 0], [1, 0, 0])).toEqual([0, 0, -1]);
  });

  // common practice: elementary vector arithmetic
  it.each([
    ["add", add([1, 2, 3], [4, 5, 6]), [5, 7, 9]],
    ["sub", sub([1, 2, 3], [4, 5, 6]), [-3, -3, -3]],
    ["scale", scale([1, -2, 3], 2), [2, -4, 6]],
    ["normalize", normalize([3, 0, 4]), [0.6, 0, 0.8]],
    ["normalize of zero stays zero", normalize([0, 0, 0]), [0, 0, 0]],
  ] as const)("%s", (_name, actual, expected) => {
    actual.forEach((value, k) => expect(value).toBeCloseTo(expected[k], 12));
  });

  it("dot, norm and angle", () => {
    // common practice: a 3-4-5 right triangle; the tetrahedral angle is acos(-1/3) = 109.47°
    expect(dot([1, 2, 3], [4, -5, 6])).toBe(12);
    expect(norm([3, 4, 0])).toBe(5);
    expect(angleDegrees([1, 0, 0], [0, 2, 0])).toBeCloseTo(90, 12);
    expect(angleDegrees([1, 1, 1], [1, -1, -1])).toBeCloseTo(109.4712, 4);
    expect(angleDegrees([1, 0, 0], [-3, 0, 0])).toBe(180);
    expect(angleDegrees([0, 0, 0], [1, 0, 0])).toBeNaN();
  });
});

describe("idealDirections", () => {
  // from memory: VSEPR electron geometries, their site counts and the ideal angles between sites
  it.each([
    ["linear", 2, [180]],
    ["trigonal planar", 3, [120]],
    ["tetrahedral", 4, [109.47]],
    ["trigonal bipyramidal", 5, [90, 120, 180]],
    ["octahedral", 6, [90, 180]],
    ["pentagonal bipyramidal", 7, [72, 90, 144, 180]],
  ] as const)("%s: %i unit vectors at the ideal angles", (geometry, count, angles) => {
    const directions = idealDirections(geometry);
    expect(directions).toHaveLength(count);
    for (const direction of directions) expect(norm(direction)).toBeCloseTo(1, 12);
    expect(distinctAngles(directions)).toEqual(angles);
    // common practice: the sites of an ideal electron geometry balance out round the centre
    const sum = directions.reduce<Vec3>((total, direction) => add(total, direction), [0, 0, 0]);
    expect(norm(sum)).toBeLessThan(1e-12);
  });

  it("octahedral trans pairs are consecutive", () => {
    // common practice: trans sites of an octahedron are 180° apart
    const directions = idealDirections("octahedral");
    for (const first of [0, 2, 4]) expect(angleDegrees(directions[first], directions[first + 1])).toBeCloseTo(180, 12);
  });

  it.each(["trigonal bipyramidal", "pentagonal bipyramidal"] as const)(
    "%s: axial sites are on ±z and every equatorial site is at 90° to them",
    (geometry) => {
      // from memory: axial-equatorial angles are 90° in both bipyramids
      const directions = idealDirections(geometry);
      expect(AXIAL_SITES[geometry]).toEqual([0, 1]);
      expect(directions[0]).toEqual([0, 0, 1]);
      expect(directions[1]).toEqual([0, 0, -1]);
      directions.forEach((direction, index) => {
        expect(siteKind(geometry, index)).toBe(index < 2 ? "axial" : "equatorial");
        if (index >= 2) expect(angleDegrees(direction, directions[0])).toBeCloseTo(90, 12);
      });
    },
  );

  it.each(["linear", "trigonal planar", "tetrahedral", "octahedral"] as const)("%s: every site is 'any'", (geometry) => {
    // common practice: these geometries have no axial/equatorial distinction
    expect(AXIAL_SITES[geometry]).toEqual([]);
    idealDirections(geometry).forEach((_, index) => expect(siteKind(geometry, index)).toBe("any"));
  });
});

describe("lone pairs fill sites in the order that gives the known shapes", () => {
  const lonePairDirections = (geometry: ElectronGeometry, lonePairs: number) =>
    lonePairSiteOrder(geometry)
      .slice(0, lonePairs)
      .map((site) => idealDirections(geometry)[site]);
  const bondDirections = (geometry: ElectronGeometry, lonePairs: number) => {
    const lone = new Set(lonePairSiteOrder(geometry).slice(0, lonePairs));
    return idealDirections(geometry).filter((_, site) => !lone.has(site));
  };

  it("every order is a permutation of the sites", () => {
    for (const geometry of [
      "linear",
      "trigonal planar",
      "tetrahedral",
      "trigonal bipyramidal",
      "octahedral",
      "pentagonal bipyramidal",
    ] as const) {
      expect([...lonePairSiteOrder(geometry)].sort()).toEqual(idealDirections(geometry).map((_, index) => index));
    }
  });

  // from memory: SF4 (AX4E) seesaw, ClF3 (AX3E2) T-shaped, XeF2 (AX2E3) linear
  it.each([
    [1, [90, 120, 180]],
    [2, [90, 180]],
    [3, [180]],
  ] as const)("trigonal bipyramidal with %i lone pair(s) leaves bond angles %j", (lonePairs, angles) => {
    for (const direction of lonePairDirections("trigonal bipyramidal", lonePairs)) {
      expect(siteKind("trigonal bipyramidal", idealDirections("trigonal bipyramidal").indexOf(direction))).toBe("equatorial");
    }
    expect(distinctAngles(bondDirections("trigonal bipyramidal", lonePairs))).toEqual(angles);
  });

  // from memory: BrF5 (AX5E) square pyramidal, XeF4 (AX4E2) square planar with lone pairs trans
  it("octahedral: two lone pairs are trans and leave a square plane", () => {
    const [first, second] = lonePairDirections("octahedral", 2);
    expect(angleDegrees(first, second)).toBeCloseTo(180, 12);
    const bonds = bondDirections("octahedral", 2);
    expect(distinctAngles(bonds)).toEqual([90, 180]);
    const normal = normalize(cross(bonds[0], bonds[2]));
    for (const bond of bonds) expect(Math.abs(dot(bond, normal))).toBeLessThan(1e-12);
  });

  // from memory: XeF5- (AX5E2) pentagonal planar with both lone pairs axial
  it("pentagonal bipyramidal: two lone pairs are axial and leave a pentagon", () => {
    expect(lonePairDirections("pentagonal bipyramidal", 2)).toEqual([
      [0, 0, 1],
      [0, 0, -1],
    ]);
    expect(distinctAngles(bondDirections("pentagonal bipyramidal", 2))).toEqual([72, 144]);
  });
});
