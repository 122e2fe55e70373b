/**
 * The core's one facade: everything the server, the command line and the tests use.
 * Pure functions over strings and plain data; no editor, protocol or I/O.
 */
export * from "./chemistry/types";
export { ELEMENTS, elementBySymbol, elementByName } from "./chemistry/elements";
export { readSpecies } from "./chemistry/reader/readSpecies";
export { analyzeSpecies, analyzeReading, analyzeSmiles } from "./chemistry/analyze";
export { parseSmiles, kekulize, writeSmiles, smilesFormula, smilesNetCharge } from "./chemistry/smiles";
export type { SmilesAtom, SmilesBond, SmilesMolecule, SmilesResult } from "./chemistry/smiles";
export { findPointGroup } from "./chemistry/symmetry/pointGroup";
export { idealDirections, siteKind, lonePairSiteOrder } from "./chemistry/geometry/idealDirections";
export type { Vec3 } from "./chemistry/geometry/vectors";
export { shapeOf, pointGroupAllowsDipole } from "./chemistry/analysis/shape3d";
export type { SpeciesShape } from "./chemistry/analysis/shape3d";
export { buildCoordinates } from "./chemistry/geometry/buildCoordinates";
export type { MolecularCoordinates, PlacedAtom, PlacedLonePair } from "./chemistry/geometry/buildCoordinates";
export { toXyz } from "./chemistry/formats/xyz";
export { toMolfile, MOLFILE_V2000_LIMIT } from "./chemistry/formats/molfile";
export type { MolfileResult } from "./chemistry/formats/molfile";
