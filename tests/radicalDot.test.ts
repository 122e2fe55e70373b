/**
 * A radical written with a dot (Cl•, NO·, •OH, O2•-) is the species with one unpaired electron,
 * not a hydrate with a missing part; hydrate and adduct dots between two formulas keep their meaning.
 */
import { describe, expect, it } from "vitest";
import { analyzeSpecies, readSpecies } from "../shared/src/index";

describe("a radical dot marks the unpaired electron", () => {
  // common practice: radicals in mechanisms and atmospheric chemistry written with a bullet or middle dot
  it.each([
    ["Cl•", "Cl", 0],
    ["Cl·", "Cl", 0],
    ["Br∙", "Br", 0],
    ["NO•", "NO", 0],
    ["NO2•", "NO2", 0],
    ["•OH", "OH", 0],
    ["HO•", "HO", 0],
    ["•CH3", "CH3", 0],
    ["CH3•", "CH3", 0],
    ["O2•-", "O2^-", -1],
    ["O2•−", "O2^-", -1],
  ])("%s reads as %s (charge %d)", (written, formula, charge) => {
    const read = readSpecies(written);
    expect(read.ok, JSON.stringify(read)).toBe(true);
    if (!read.ok) return;
    expect(read.value.formula).toBe(formula);
    expect(read.value.charge).toBe(charge);
    expect(read.value.range).toEqual({ start: 0, end: written.length });
  });

  // from memory: Atkins, Physical Chemistry (NO, NO2, CH3 and OH are radicals with one unpaired electron)
  it.each(["NO•", "NO2•", "•CH3", "•OH"])("%s is analysed as a radical", (written) => {
    const result = analyzeSpecies(written);
    expect(result.ok).toBe(true);
    if (result.ok) expect(result.value.radical).toBe(true);
  });

  it.each([
    ["H2O•", 8],
    ["CH4•", 8],
  ])("%s: the dot on a species with an even electron count (%d) is questioned, not called a hydrate", (written, electrons) => {
    const read = readSpecies(written);
    expect(read.ok).toBe(false);
    if (read.ok) return;
    expect(read.problem.message).toContain(`even number of valence electrons (${electrons})`);
    expect(read.problem.message).not.toMatch(/hydrate/);
  });

  // common practice: dots between two formulas are hydrates and adducts
  it.each([
    ["CuSO4·5H2O", "hydrate"],
    ["CuSO4•5H2O", "hydrate"],
    ["BF3·NH3", "adduct"],
  ])("%s is still a %s", (written, code) => {
    const result = analyzeSpecies(written);
    expect(result.ok).toBe(false);
    if (!result.ok) expect(result.problem.code).toBe(code);
  });
});
