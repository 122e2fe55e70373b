// `analyze` on a reagent's label as people write it: the grade, form or strength around the name
// is set aside with a note, and the species is what the name alone names.
import { beforeAll, describe, expect, it } from "vitest";
import { ensureBuilt, runCli } from "./cliRunner";

interface JsonCard {
  readonly input: string;
  readonly ok: boolean;
  readonly formula?: string;
  readonly warnings?: readonly string[];
  readonly error?: { readonly code: string; readonly message: string };
}

function analyzeAll(texts: readonly string[]): Map<string, JsonCard> {
  const run = runCli(["analyze", "--json", ...texts]);
  const cards = JSON.parse(run.stdout) as JsonCard[];
  return new Map(cards.map((card) => [card.input, card]));
}

// from memory: CRC Handbook of Chemistry and Physics (the species of these bench reagents); the
// label words themselves are common practice
const LABELS: readonly (readonly [label: string, formula: string, qualifiers: string])[] = [
  ["ammonia solution", "NH3", "solution"],
  ["Ammonia solution 25% w/w", "NH3", "solution 25% w/w"],
  ["ammonia in water", "NH3", "in water"],
  ["hydrochloric acid, 37%", "HCl", "37%"],
  ["Hydrochloric acid 2 M", "HCl", "2 M"],
  ["sulfuric acid (conc.)", "H2SO4", "(conc.)"],
  ["dilute nitric acid", "HNO3", "dilute"],
  ["conc. HCl", "HCl", "conc."],
  ["glacial acetic acid", "CH3COOH", "glacial"],
  ["fuming nitric acid", "HNO3", "fuming"],
  ["Cl2 gas", "Cl2", "gas"],
  ["hydrogen peroxide solution, 30%", "HOOH", "solution, 30%"],
];

// common practice: text that names no species stays unread, whatever words stand around it
const UNREAD: readonly (readonly [label: string, code: string])[] = [
  ["solution", "unknown-name"],
  ["dilute", "unknown-name"],
  ["gibberish solution", "unknown-name"],
  ["acetone (propanone)", "unknown-name"],
  ["ammonia (household)", "unknown-name"],
];

// from memory: CRC Handbook of Chemistry and Physics (these salts dissolve in water as their
// ions, each hydrated; the solid is a lattice of the same ions); label words are common practice
const SALT_LABELS: readonly (readonly [label: string, formula: string, qualifiers: string, dissolved: boolean])[] = [
  ["sodium chloride solution", "NaCl", "solution", true],
  ["Sodium chloride solution 0.9% w/v", "NaCl", "solution 0.9% w/v", true],
  ["potassium nitrate solution, 0.1 M", "KNO3", "solution, 0.1 M", true],
  ["aqueous copper(II) sulfate", "CuSO4", "aqueous", true],
  ["saturated sodium carbonate", "Na2CO3", "saturated", true],
  ["sodium chloride crystals", "NaCl", "crystals", false],
  ["potassium permanganate, ACS reagent", "KMnO4", "ACS reagent", false],
  ["ammonium chloride powder", "NH4Cl", "powder", false],
];

let cards = new Map<string, JsonCard>();

beforeAll(() => {
  ensureBuilt();
  cards = analyzeAll([
    ...LABELS.map(([label]) => label),
    ...UNREAD.map(([label]) => label),
    ...SALT_LABELS.map(([label]) => label),
    "ammonia",
    "HCl",
    "NaCl",
    "NaCl(aq)",
  ]);
});

describe("analyze on a reagent label", () => {
  it.each(LABELS)("%s is %s, and the card says %s was set aside", (label, formula, qualifiers) => {
    const card = cards.get(label);
    expect(card?.ok, label).toBe(true);
    expect(card?.formula).toBe(formula);
    expect(card?.warnings?.some((warning) => warning.includes(`"${qualifiers}"`) && warning.includes("grade, form or strength"))).toBe(
      true,
    );
  });

  it.each(UNREAD)("%s is not read (%s)", (label, code) => {
    const card = cards.get(label);
    expect(card?.ok).toBe(false);
    expect(card?.error?.code).toBe(code);
  });

  // common practice: a plain name or formula has no label note
  it.each([["ammonia"], ["HCl"]])("%s has no label note", (text) => {
    expect(cards.get(text)?.warnings?.some((warning) => warning.includes("grade, form or strength"))).toBe(false);
  });
});

describe("a salt's card on a reagent label", () => {
  it.each(SALT_LABELS)("%s is %s, %s set aside (a solution: %s)", (label, formula, qualifiers, dissolved) => {
    const card = cards.get(label);
    expect(card?.ok).toBe(false);
    expect(card?.formula).toBe(formula);
    const message = card?.error?.message ?? "";
    expect(message).toContain(`"${qualifiers}" says the reagent's grade, form or strength`);
    // a solution holds hydrated ions, never a lattice; a solid keeps its lattice card
    expect(card?.error?.code).toBe(dissolved ? "ions-in-solution" : "ionic-solid");
    expect(message.includes("hydrated")).toBe(dissolved);
    expect(message.includes("lattice of ions")).toBe(!dissolved);
  });

  // common practice: a state symbol says the same as a label; a bare formula is the solid
  it.each([
    ["NaCl(aq)", "ions-in-solution"],
    ["NaCl", "ionic-solid"],
  ])("%s is %s, with no label note", (text, code) => {
    const card = cards.get(text);
    expect(card?.error?.code).toBe(code);
    expect(card?.error?.message).not.toContain("grade, form or strength");
  });
});
