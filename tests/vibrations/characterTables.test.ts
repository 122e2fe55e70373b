// Character tables: every finite point group the symmetry search can name, checked by the
// great orthogonality theorem (rows and columns), the sum of squared dimensions, and against the
// printed tables of group-theory texts for what spans x, y, z and the quadratic functions.
import { describe, expect, it } from "vitest";
import { characterTable, type CharacterTable } from "../../shared/src/index";

const AXIAL_ORDERS = [2, 3, 4, 5, 6, 7, 8];
// common practice: the point groups of chemistry; axial orders to 8 cover every molecule the
// search meets (larger rings give larger n by the same rule)
const GROUPS: readonly string[] = [
  "C1",
  "Cs",
  "Ci",
  ...AXIAL_ORDERS.flatMap((n) => [`C${n}`, `C${n}v`, `C${n}h`, `D${n}`, `D${n}h`, `D${n}d`]),
  "S4",
  "S6",
  "S8",
  "T",
  "Td",
  "Th",
  "O",
  "Oh",
  "I",
  "Ih",
];

/** A character as a complex number. */
type Complex = readonly [number, number];

/** The table with each complex-conjugate pair written out as its two members. */
function complexRows(table: CharacterTable): { label: string; values: Complex[] }[] {
  return table.irreps.flatMap((irrep) => {
    if (!irrep.imaginaryParts) return [{ label: irrep.label, values: irrep.characters.map((re): Complex => [re, 0]) }];
    const imaginary = irrep.imaginaryParts;
    return [1, -1].map((sign) => ({
      label: `${irrep.label}${sign > 0 ? "(a)" : "(b)"}`,
      values: irrep.characters.map((sum, index): Complex => [sum / 2, sign * imaginary[index]]),
    }));
  });
}

/** Σ a · conj(b), real part (the imaginary part of these sums vanishes as well; checked too). */
function product(a: Complex, b: Complex): Complex {
  return [a[0] * b[0] + a[1] * b[1], a[1] * b[0] - a[0] * b[1]];
}

describe.each(GROUPS)("character table of %s", (group) => {
  const table = characterTable(group);

  it("exists, with class sizes adding up to the order", () => {
    expect(table, `no table for ${group}`).toBeDefined();
    const sizes = table!.classes.reduce((sum, c) => sum + c.size, 0);
    expect(sizes, `class sizes of ${group} add up to ${sizes}, not the order ${table!.order}`).toBe(table!.order);
  });

  // source: the great orthogonality theorem (any group-theory text): Σ_c g_c χ_i(c) χ_j(c)* = h δ_ij
  it("rows are orthogonal and each has norm h", () => {
    const rows = complexRows(table!);
    for (const a of rows) {
      for (const b of rows) {
        let re = 0;
        let im = 0;
        table!.classes.forEach((c, index) => {
          const [r, i] = product(a.values[index], b.values[index]);
          re += c.size * r;
          im += c.size * i;
        });
        const expected = a.label === b.label ? table!.order : 0;
        expect(Math.abs(re - expected), `⟨${a.label}, ${b.label}⟩ in ${group} is ${re}, not ${expected}`).toBeLessThan(1e-9);
        expect(Math.abs(im)).toBeLessThan(1e-9);
      }
    }
  });

  // source: the second orthogonality relation: Σ_i χ_i(c) χ_i(c′)* = (h / g_c) δ_cc′
  it("columns are orthogonal, with norm h / g_c", () => {
    const rows = complexRows(table!);
    table!.classes.forEach((first, c1) => {
      table!.classes.forEach((second, c2) => {
        let re = 0;
        for (const row of rows) re += product(row.values[c1], row.values[c2])[0];
        const expected = c1 === c2 ? table!.order / first.size : 0;
        expect(Math.abs(re - expected), `columns ${first.name} and ${second.name} of ${group}: ${re}, not ${expected}`).toBeLessThan(1e-9);
      });
    });
  });

  // source: Burnside's theorem: the squared dimensions of the irreducible representations add up to h;
  // the number of irreducible representations equals the number of classes
  it("squared dimensions add up to the order; as many irreducible representations as classes", () => {
    const rows = complexRows(table!);
    const squares = rows.reduce((sum, row) => sum + row.values[0][0] ** 2, 0);
    expect(squares).toBe(table!.order);
    expect(rows.length).toBe(table!.classes.length);
  });

  // common practice: x, y, z span three dimensions and the rotations three
  it("x, y, z and the rotations are each placed once", () => {
    const dimensionOf = (labels: readonly string[], degeneracy: number) =>
      labels.reduce((sum, label) => sum + (label.startsWith("(") ? degeneracy : 1), 0);
    const linear = table!.irreps.reduce((sum, irrep) => sum + dimensionOf(irrep.linear, irrep.degeneracy), 0);
    const rotations = table!.irreps.reduce((sum, irrep) => sum + dimensionOf(irrep.rotations, irrep.degeneracy), 0);
    expect(linear, `x, y, z in ${group}`).toBe(3);
    expect(rotations, `Rx, Ry, Rz in ${group}`).toBe(3);
  });
});

// from memory: the character tables printed in standard chemical group theory texts (the
// appendix tables of Cotton's "Chemical Applications of Group Theory" and of Harris & Bertolucci's
// "Symmetry and Spectroscopy"): the symmetries that span x, y or z (IR-active) and the
// quadratic functions (Raman-active), and what spans z alone
const ACTIVITY: readonly { group: string; ir: string; raman: string; z: string; order: number }[] = [
  { group: "C2v", ir: "A1 B1 B2", raman: "A1 A2 B1 B2", z: "A1", order: 4 },
  { group: "C3v", ir: "A1 E", raman: "A1 E", z: "A1", order: 6 },
  { group: "C4v", ir: "A1 E", raman: "A1 B1 B2 E", z: "A1", order: 8 },
  { group: "C2h", ir: "Au Bu", raman: "Ag Bg", z: "Au", order: 4 },
  { group: "D2h", ir: "B1u B2u B3u", raman: "Ag B1g B2g B3g", z: "B1u", order: 8 },
  { group: "D3h", ir: "E′ A2″", raman: "A1′ E′ E″", z: "A2″", order: 12 },
  { group: "D4h", ir: "A2u Eu", raman: "A1g B1g B2g Eg", z: "A2u", order: 16 },
  { group: "D5h", ir: "E1′ A2″", raman: "A1′ E2′ E1″", z: "A2″", order: 20 },
  { group: "D6h", ir: "A2u E1u", raman: "A1g E1g E2g", z: "A2u", order: 24 },
  { group: "D2d", ir: "B2 E", raman: "A1 B1 B2 E", z: "B2", order: 8 },
  { group: "D3d", ir: "A2u Eu", raman: "A1g Eg", z: "A2u", order: 12 },
  { group: "D4d", ir: "B2 E1", raman: "A1 E2 E3", z: "B2", order: 16 },
  { group: "S4", ir: "B E", raman: "A B E", z: "B", order: 4 },
  { group: "S6", ir: "Au Eu", raman: "Ag Eg", z: "Au", order: 6 },
  { group: "Td", ir: "T2", raman: "A1 E T2", z: "", order: 24 },
  { group: "Oh", ir: "T1u", raman: "A1g Eg T2g", z: "", order: 48 },
  { group: "Th", ir: "Tu", raman: "Ag Eg Tg", z: "", order: 24 },
  { group: "Ih", ir: "T1u", raman: "Ag Hg", z: "", order: 120 },
  { group: "C3h", ir: "E′ A″", raman: "A′ E′ E″", z: "A″", order: 6 },
  { group: "Cs", ir: "A′ A″", raman: "A′ A″", z: "A″", order: 2 },
  { group: "Ci", ir: "Au", raman: "Ag", z: "Au", order: 2 },
];

describe("IR and Raman activity against the printed tables", () => {
  const sorted = (text: string) => text.split(" ").filter(Boolean).sort().join(" ");
  it.each(ACTIVITY)("$group: IR $ir; Raman $raman; z in $z", ({ group, ir, raman, z, order }) => {
    const table = characterTable(group)!;
    expect(table.order).toBe(order);
    const labels = (pick: (irrep: CharacterTable["irreps"][number]) => boolean) =>
      sorted(
        table.irreps
          .filter(pick)
          .map((irrep) => irrep.label)
          .join(" "),
      );
    expect(
      labels((irrep) => irrep.ir),
      `IR-active symmetries of ${group}`,
    ).toBe(sorted(ir));
    expect(
      labels((irrep) => irrep.raman),
      `Raman-active symmetries of ${group}`,
    ).toBe(sorted(raman));
    expect(
      labels((irrep) => irrep.linear.includes("z")),
      `the symmetry of z in ${group}`,
    ).toBe(sorted(z));
  });

  // from memory: the Oh table of standard group theory texts: T1u row 3 0 −1 1 −1 −3 0 1 −1 1 over
  // E 8C3 6C2 6C4 3C2 i 8S6 6σd 6S4 3σh (columns reordered to the core's class order by name)
  it("Oh's T1u has the printed characters", () => {
    const table = characterTable("Oh")!;
    const printed: Record<string, number> = {
      E: 3,
      "8C3": 0,
      "6C2": -1,
      "6C4": 1,
      "3C2(=C4²)": -1,
      i: -3,
      "8S6": 0,
      "6σd": 1,
      "6S4": -1,
      "3σh": 1,
    };
    const t1u = table.irreps.find((irrep) => irrep.label === "T1u")!;
    table.classes.forEach((c, index) => expect(t1u.characters[index], `χ(${c.name}) of T1u`).toBe(printed[c.name]));
  });

  // source: the definition of a centrosymmetric group: it holds i
  it.each([
    ["Ci", true],
    ["C2h", true],
    ["D6h", true],
    ["D3d", true],
    ["S6", true],
    ["Oh", true],
    ["Ih", true],
    ["Td", false],
    ["D3h", false],
    ["D4d", false],
    ["C2v", false],
    ["S4", false],
  ] as const)("%s centrosymmetric: %s", (group, expected) => {
    expect(characterTable(group)!.centrosymmetric).toBe(expected);
  });

  // source: the mutual exclusion rule: in a centrosymmetric group no symmetry is both IR- and Raman-active
  it.each(GROUPS.filter((group) => characterTable(group)?.centrosymmetric))("%s: no symmetry is both IR- and Raman-active", (group) => {
    const both = characterTable(group)!.irreps.filter((irrep) => irrep.ir && irrep.raman);
    expect(both.map((irrep) => irrep.label)).toEqual([]);
  });

  // common practice: infinite groups and the atom's group have no finite character table here
  it.each(["C∞v", "D∞h", "Kh", "C0", "D1h", "S3", "X2"])("%s has no finite table", (group) => {
    expect(characterTable(group)).toBeUndefined();
  });
});
