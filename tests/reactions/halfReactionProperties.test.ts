/**
 * Property tests for completing equations in solution. Random redox half-reactions (and overall
 * equations made of two of them) are balanced here by the textbook ion-electron method, worked
 * independently of lonepair's null-space balancer: balance the element that changes, then O
 * with H2O, H with H+, charge with e-, and in base add OH- to both sides and net the water.
 * Stripped of H+, OH-, H2O, e- and every coefficient, the skeleton must complete to the same
 * equation.
 */
import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { balanceInSolution, balanceText, type SolutionMedium } from "../../shared/src/index";

/** A species with the counts the method needs, typed in here, not read by lonepair. */
interface Species {
  readonly text: string;
  /** Atoms of the element whose oxidation state changes. */
  readonly key: number;
  readonly O: number;
  readonly H: number;
  readonly charge: number;
}

/** A redox couple: the oxidised form, the reduced form, and the element that changes. */
interface Couple {
  readonly element: string;
  readonly oxidised: Species;
  readonly reduced: Species;
}

function species(text: string, key: number, O: number, H: number, charge: number): Species {
  return { text, key, O, H, charge };
}

// common practice: couples from tables of standard reduction potentials in general chemistry texts
const COUPLES: readonly Couple[] = [
  { element: "Mn", oxidised: species("MnO4-", 1, 4, 0, -1), reduced: species("Mn^2+", 1, 0, 0, 2) },
  { element: "Mn", oxidised: species("MnO4-", 1, 4, 0, -1), reduced: species("MnO2", 1, 2, 0, 0) },
  { element: "Mn", oxidised: species("MnO4-", 1, 4, 0, -1), reduced: species("MnO4^2-", 1, 4, 0, -2) },
  { element: "Cr", oxidised: species("Cr2O7^2-", 2, 7, 0, -2), reduced: species("Cr^3+", 1, 0, 0, 3) },
  { element: "Cr", oxidised: species("CrO4^2-", 1, 4, 0, -2), reduced: species("Cr(OH)3", 1, 3, 3, 0) },
  { element: "N", oxidised: species("NO3-", 1, 3, 0, -1), reduced: species("NO", 1, 1, 0, 0) },
  { element: "N", oxidised: species("NO3-", 1, 3, 0, -1), reduced: species("NO2", 1, 2, 0, 0) },
  { element: "N", oxidised: species("NO3-", 1, 3, 0, -1), reduced: species("NH4+", 1, 0, 4, 1) },
  { element: "N", oxidised: species("HNO2", 1, 2, 1, 0), reduced: species("N2O", 2, 1, 0, 0) },
  { element: "Cl", oxidised: species("ClO3-", 1, 3, 0, -1), reduced: species("Cl-", 1, 0, 0, -1) },
  { element: "Cl", oxidised: species("ClO4-", 1, 4, 0, -1), reduced: species("Cl2", 2, 0, 0, 0) },
  { element: "Cl", oxidised: species("ClO-", 1, 1, 0, -1), reduced: species("Cl-", 1, 0, 0, -1) },
  { element: "Br", oxidised: species("BrO3-", 1, 3, 0, -1), reduced: species("Br-", 1, 0, 0, -1) },
  { element: "I", oxidised: species("IO3-", 1, 3, 0, -1), reduced: species("I2", 2, 0, 0, 0) },
  { element: "S", oxidised: species("SO4^2-", 1, 4, 0, -2), reduced: species("SO2", 1, 2, 0, 0) },
  { element: "S", oxidised: species("SO4^2-", 1, 4, 0, -2), reduced: species("H2S", 1, 0, 2, 0) },
  { element: "S", oxidised: species("SO4^2-", 1, 4, 0, -2), reduced: species("SO3^2-", 1, 3, 0, -2) },
  { element: "Fe", oxidised: species("Fe^3+", 1, 0, 0, 3), reduced: species("Fe^2+", 1, 0, 0, 2) },
  { element: "Cu", oxidised: species("Cu^2+", 1, 0, 0, 2), reduced: species("Cu", 1, 0, 0, 0) },
  { element: "Pb", oxidised: species("PbO2", 1, 2, 0, 0), reduced: species("Pb^2+", 1, 0, 0, 2) },
  { element: "Sn", oxidised: species("Sn^4+", 1, 0, 0, 4), reduced: species("Sn^2+", 1, 0, 0, 2) },
  { element: "V", oxidised: species("VO2+", 1, 2, 0, 1), reduced: species("VO^2+", 1, 1, 0, 2) },
  { element: "As", oxidised: species("H3AsO4", 1, 4, 3, 0), reduced: species("HAsO2", 1, 2, 1, 0) },
  { element: "Ag", oxidised: species("Ag+", 1, 0, 0, 1), reduced: species("Ag", 1, 0, 0, 0) },
];

/** Signed amounts: positive on the left, negative on the right; "H+", "OH-", "H2O", "e-" included. */
type Amounts = Map<string, number>;

function gcd(a: number, b: number): number {
  return b === 0 ? Math.abs(a) : gcd(b, a % b);
}

function addTo(amounts: Amounts, text: string, amount: number): void {
  const total = (amounts.get(text) ?? 0) + amount;
  if (total === 0) amounts.delete(text);
  else amounts.set(text, total);
}

/** The reduction half-reaction of `couple` by the ion-electron method, in `medium`. */
function reductionHalf(couple: Couple, medium: SolutionMedium): Amounts {
  const { oxidised: from, reduced: to } = couple;
  const common = gcd(from.key, to.key);
  const [a, b] = [to.key / common, from.key / common];
  const amounts: Amounts = new Map([
    [from.text, a],
    [to.text, -b],
  ]);
  // Oxygen with water on the side short of it, then hydrogen with H+, then charge with electrons.
  const water = a * from.O - b * to.O;
  addTo(amounts, "H2O", -water);
  const hydrogen = a * from.H - b * to.H - 2 * water;
  addTo(amounts, "H+", -hydrogen);
  const charge = a * from.charge - b * to.charge - hydrogen;
  addTo(amounts, "e-", charge);
  if (medium === "basic") {
    const protons = amounts.get("H+") ?? 0;
    amounts.delete("H+");
    // H+ + OH- -> H2O on the H+ side; as many OH- on the other side.
    addTo(amounts, "H2O", protons);
    addTo(amounts, "OH-", -protons);
  }
  return amounts;
}

function scaled(amounts: Amounts, by: number): Amounts {
  return new Map([...amounts].map(([text, amount]) => [text, amount * by]));
}

function smallest(amounts: Amounts): Amounts {
  const divisor = [...amounts.values()].reduce((d, amount) => gcd(d, amount), 0);
  return scaled(amounts, 1 / divisor);
}

/** `amounts` written as an equation: species in `order`, then the rest, in the given style. */
function written(amounts: Amounts, order: readonly string[], glued: boolean): string {
  const texts = [...order, ...[...amounts.keys()].filter((text) => !order.includes(text))];
  const side = (sign: number) =>
    texts
      .filter((text) => Math.sign(amounts.get(text) ?? 0) === sign)
      .map((text) => {
        const size = Math.abs(amounts.get(text)!);
        return size === 1 ? text : `${size}${glued ? "" : " "}${text}`;
      })
      .join(" + ");
  return `${side(1)} -> ${side(-1)}`;
}

/** Reads "2 MnO4- + 16 H+ -> ..." back into signed amounts. */
function amountsOf(equation: string): Amounts {
  const amounts: Amounts = new Map();
  const [left, right] = equation.replace(/^\\ce\{|\}$/g, "").split(" -> ");
  for (const [text, sign] of [
    [left, 1],
    [right, -1],
  ] as const) {
    for (const term of text.split(" + ")) {
      const match = /^(\d+)\s?(\D.*)$/.exec(term);
      addTo(amounts, match ? match[2] : term, sign * (match ? Number(match[1]) : 1));
    }
  }
  return amounts;
}

const medium = fc.constantFrom<SolutionMedium>("acidic", "basic");

describe("random half-reactions", () => {
  const half = fc.record({
    couple: fc.constantFrom(...COUPLES),
    medium,
    oxidation: fc.boolean(),
    glued: fc.boolean(),
    mhchem: fc.boolean(),
  });

  it("stripped to their two species, complete to the ion-electron answer", () => {
    fc.assert(
      fc.property(half, ({ couple, medium, oxidation, glued, mhchem }) => {
        const reduction = reductionHalf(couple, medium);
        const expected = oxidation ? scaled(reduction, -1) : reduction;
        const [first, second] = oxidation ? [couple.reduced, couple.oxidised] : [couple.oxidised, couple.reduced];
        // The generated half-reaction is balanced as written.
        const full = written(expected, [first.text, second.text], glued);
        const check = balanceText(full);
        expect(check.ok && check.wasBalanced, full).toBe(true);
        const skeleton = `${first.text} -> ${second.text}`;
        const answer = balanceInSolution(mhchem ? `\\ce{${skeleton}}` : skeleton, medium);
        expect(answer.ok, `${skeleton} in ${medium}`).toBe(true);
        if (!answer.ok) return;
        expect(Object.fromEntries(amountsOf(answer.equation)), `${skeleton} in ${medium}`).toEqual(Object.fromEntries(expected));
        const again = balanceText(answer.equation);
        expect(again.ok && again.wasBalanced).toBe(true);
      }),
      { numRuns: 200, seed: 48 },
    );
  });
});

describe("random overall equations from two half-reactions", () => {
  const pair = fc
    .record({ oxidised: fc.constantFrom(...COUPLES), reduced: fc.constantFrom(...COUPLES), medium })
    .filter(({ oxidised, reduced }) => oxidised.element !== reduced.element);

  it("stripped to their four species, complete to the combined answer without electrons", () => {
    fc.assert(
      fc.property(pair, ({ oxidised, reduced, medium }) => {
        // `reduced` is the couple that is reduced; `oxidised` the one that is oxidised.
        const reduction = reductionHalf(reduced, medium);
        const oxidation = scaled(reductionHalf(oxidised, medium), -1);
        const [taken, given] = [reduction.get("e-")!, -oxidation.get("e-")!];
        const overall = new Map<string, number>();
        for (const [text, amount] of scaled(reduction, given / gcd(taken, given))) addTo(overall, text, amount);
        for (const [text, amount] of scaled(oxidation, taken / gcd(taken, given))) addTo(overall, text, amount);
        const expected = smallest(overall);
        expect(expected.has("e-")).toBe(false);
        const order = [reduced.oxidised.text, oxidised.reduced.text, reduced.reduced.text, oxidised.oxidised.text];
        const skeleton = `${order[0]} + ${order[1]} -> ${order[2]} + ${order[3]}`;
        const answer = balanceInSolution(skeleton, medium);
        expect(answer.ok, `${skeleton} in ${medium}`).toBe(true);
        if (!answer.ok) return;
        expect(Object.fromEntries(amountsOf(answer.equation)), `${skeleton} in ${medium}`).toEqual(Object.fromEntries(expected));
      }),
      { numRuns: 200, seed: 49 },
    );
  });
});
