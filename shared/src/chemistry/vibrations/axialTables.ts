/**
 * Character tables of the axial point groups (Cn, Cnv, Cnh, Dn, Dnh, Dnd, S2n, Cs, Ci, C1), built
 * from the structure every one of them shares: a cyclic group of rotations (or of S2n improper
 * rotations) about z, perhaps with n "flips" (C2′ axes or σv planes) that make it dihedral, perhaps
 * times {E, σh}. Characters follow from that structure; labels follow Mulliken's rules.
 */
import { dot, type Vec3 } from "../geometry/vectors";
import {
  composeOperations,
  HORIZONTAL_MIRROR,
  IDENTITY_OPERATION,
  operation,
  operationName,
  X_AXIS,
  Z_AXIS,
  type ClassOperation,
} from "./classOperation";
import type { RawCharacterTable, RawIrrep, SymmetryClass } from "./tableTypes";

/** Characters before labelling, with the index m of a two-dimensional one (χ(G^k) = 2cos 2πmk/N). */
interface Unlabelled {
  readonly characters: readonly number[];
  readonly imaginaryParts?: readonly number[];
}

interface Built {
  readonly classes: readonly SymmetryClass[];
  readonly irreps: readonly Unlabelled[];
  /** Class index of the first class of flips (C2′ or σv), which decides the subscripts 1 and 2. */
  readonly flipClass?: number;
  /** D2-type groups: the classes of C2(z), C2(y), C2(x), which decide B1, B2 and B3. */
  readonly threeAxes?: readonly [number, number, number];
}

const ROUNDING = 1e-9;

function clean(value: number): number {
  // + 0 turns −0 into 0.
  const rounded = Math.round(value) + 0;
  return Math.abs(value - rounded) < ROUNDING ? rounded : value;
}

/** The powers of one generator about z: `power(k)` is the operation G^k. */
type Powers = (k: number) => ClassOperation;

const rotations =
  (n: number): Powers =>
  (k) =>
    operation(true, k / n, Z_AXIS);
const improperRotations =
  (n: number): Powers =>
  (k) =>
    operation(k % 2 === 0, k / n, Z_AXIS);

function cyclic(order: number, power: Powers): Built {
  const classes = Array.from({ length: order }, (_, k) => {
    const op = k === 0 ? IDENTITY_OPERATION : power(k);
    return { name: operationName(op, false), size: 1, operation: op };
  });
  const irreps: Unlabelled[] = [];
  for (let m = 0; m <= order / 2; m++) {
    if (m === 0 || 2 * m === order) {
      irreps.push({ characters: classes.map((_, k) => (m === 0 ? 1 : (-1) ** k)) });
    } else {
      irreps.push({
        characters: classes.map((_, k) => clean(2 * Math.cos((2 * Math.PI * m * k) / order))),
        imaginaryParts: classes.map((_, k) => clean(Math.sin((2 * Math.PI * m * k) / order))),
      });
    }
  }
  return { classes, irreps };
}

/**
 * The dihedral pattern: G of order N about z and N flips F_j = G^j·F_0. For even N the flips fall
 * into two classes (F_0's and F_1's), named by `flipNames`.
 */
function dihedral(order: number, power: Powers, firstFlip: ClassOperation, flipNames: readonly [string, string]): Built {
  const classes: SymmetryClass[] = [{ name: "E", size: 1, operation: IDENTITY_OPERATION }];
  const powers: number[] = [0];
  for (let k = 1; 2 * k < order; k++) {
    const op = power(k);
    classes.push({ name: `2${operationName(op, true)}`, size: 2, operation: op });
    powers.push(k);
  }
  const even = order % 2 === 0;
  if (even) {
    const op = power(order / 2);
    classes.push({ name: operationName(op, false), size: 1, operation: op });
    powers.push(order / 2);
  }
  const flipClass = classes.length;
  if (even) {
    const count = order > 2 ? String(order / 2) : "";
    classes.push({ name: `${count}${flipNames[0]}`, size: order / 2, operation: firstFlip });
    classes.push({ name: `${count}${flipNames[1]}`, size: order / 2, operation: composeOperations(power(1), firstFlip) });
  } else {
    classes.push({ name: `${order}${flipNames[0]}`, size: order, operation: firstFlip });
  }
  const flips = classes.length - flipClass;
  const rotationPart = (valueAt: (k: number) => number) => powers.map((k) => clean(valueAt(k)));
  const irreps: Unlabelled[] = [
    { characters: [...rotationPart(() => 1), ...Array<number>(flips).fill(1)] },
    { characters: [...rotationPart(() => 1), ...Array<number>(flips).fill(-1)] },
  ];
  if (even) {
    irreps.push({ characters: [...rotationPart((k) => (-1) ** k), 1, -1] });
    irreps.push({ characters: [...rotationPart((k) => (-1) ** k), -1, 1] });
  }
  for (let m = 1; 2 * m < order; m++) {
    irreps.push({
      characters: [...rotationPart((k) => 2 * Math.cos((2 * Math.PI * m * k) / order)), ...Array<number>(flips).fill(0)],
    });
  }
  return { classes, irreps, flipClass };
}

/** The group times {E, σh}: each class again after σh, each irrep once even and once odd under σh. */
function withHorizontalMirror(built: Built, nameOf: (op: ClassOperation, source: SymmetryClass) => string): Built {
  const mirrored = built.classes.map((source) => {
    const op = composeOperations(HORIZONTAL_MIRROR, source.operation);
    return { name: nameOf(op, source), size: source.size, operation: op };
  });
  const irreps: Unlabelled[] = [];
  for (const sign of [1, -1]) {
    for (const irrep of built.irreps) {
      irreps.push({
        characters: [...irrep.characters, ...irrep.characters.map((value) => clean(sign * value))],
        ...(irrep.imaginaryParts
          ? { imaginaryParts: [...irrep.imaginaryParts, ...irrep.imaginaryParts.map((value) => clean(sign * value))] }
          : {}),
      });
    }
  }
  return { ...built, classes: [...built.classes, ...mirrored], irreps };
}

function isAboutZ(axis: Vec3): boolean {
  return Math.abs(Math.abs(dot(axis, Z_AXIS)) - 1) < 1e-9;
}

/** Names of the classes made by σh: σh, i, S_n about z; σv/σd from the flips they came from. */
function horizontalProductName(flipToMirror: Readonly<Record<string, string>>) {
  return (op: ClassOperation, source: SymmetryClass): string => {
    const count = source.size > 1 ? String(source.size) : "";
    if (isAboutZ(op.axis) || (!op.proper && op.turn === 0.5)) {
      if (!op.proper && op.turn === 0 && isAboutZ(op.axis)) return "σh";
      return `${count}${operationName(op, source.size > 1)}`;
    }
    const flip = source.name.replace(/^\d+/, "");
    return `${count}${flipToMirror[flip] ?? "σv"}`;
  };
}

const C2_X = operation(true, 0.5, X_AXIS);
const MIRROR_XZ = operation(false, 0, [0, 1, 0]);

/** Builds an axial group's table from its Schoenflies symbol, or undefined for any other symbol. */
export function axialTable(group: string): RawCharacterTable | undefined {
  const built = buildAxial(group);
  return built && { group, classes: built.classes, irreps: labelIrreps(built) };
}

/** Largest n accepted: tables grow with n, and the point-group search names no larger axis in practice. */
export const MAX_AXIAL_ORDER = 24;

function buildAxial(group: string): Built | undefined {
  if (group === "C1") return cyclic(1, rotations(1));
  if (group === "Cs") return withHorizontalMirror(cyclic(1, rotations(1)), horizontalProductName({}));
  if (group === "Ci") return cyclic(2, improperRotations(2));
  const match = /^([CDS])(\d+)([vhd]?)$/.exec(group);
  if (!match) return undefined;
  const [, family, digits, suffix] = match;
  const n = Number(digits);
  if (!(n >= 1 && n <= MAX_AXIAL_ORDER)) return undefined;
  if (family === "S") return suffix === "" && n % 2 === 0 && n >= 4 ? cyclic(n, improperRotations(n)) : undefined;
  if (family === "C") {
    if (suffix === "") return cyclic(n, rotations(n));
    if (suffix === "h") return withHorizontalMirror(cyclic(n, rotations(n)), horizontalProductName({}));
    if (suffix === "v" && n >= 2) {
      return n === 2 ? dihedral(2, rotations(2), MIRROR_XZ, ["σv(xz)", "σv′(yz)"]) : dihedral(n, rotations(n), MIRROR_XZ, ["σv", "σd"]);
    }
    return undefined;
  }
  if (n < 2) return undefined;
  if (n === 2 && suffix !== "d") {
    const d2 = dihedral(2, rotations(2), C2_X, ["C2(x)", "C2(y)"]);
    const renamed = { ...d2, classes: d2.classes.map((c) => (c.name === "C2" ? { ...c, name: "C2(z)" } : c)) };
    const threeAxes: [number, number, number] = [1, 3, 2];
    if (suffix === "") return { ...renamed, threeAxes };
    if (suffix === "h") {
      return { ...withHorizontalMirror(renamed, horizontalProductName({ "C2(x)": "σ(xz)", "C2(y)": "σ(yz)" })), threeAxes };
    }
    return undefined;
  }
  const single: [string, string] = n % 2 === 0 ? ["C2′", "C2″"] : ["C2", "C2″"];
  if (suffix === "") return dihedral(n, rotations(n), C2_X, single);
  if (suffix === "h") {
    const named = n % 2 === 0 ? single : (["C2′", "C2″"] as [string, string]);
    return withHorizontalMirror(dihedral(n, rotations(n), C2_X, named), horizontalProductName({ "C2′": "σv", "C2″": "σd" }));
  }
  if (suffix === "d") return dihedral(2 * n, improperRotations(2 * n), C2_X, ["C2′", "σd"]);
  return undefined;
}

/**
 * Mulliken's labels: A or B by the character under the principal operation (C_n, or S_2n in a
 * group without i whose highest-order element is S_2n), E for two dimensions; subscript 1 or 2
 * by the first flip class (C2′ or σv), or B1/B2/B3 by C2(z)/C2(y)/C2(x); g/u by i, else ′/″ by
 * σh; E1, E2, ... numbered only where two E's would otherwise share a label.
 */
function labelIrreps(built: Built): RawIrrep[] {
  const { classes, irreps } = built;
  const inversion = classes.findIndex((c) => !c.operation.proper && c.operation.turn === 0.5);
  const horizontal = classes.findIndex((c) => c.name === "σh");
  const principal = principalClass(classes, inversion >= 0);
  const principalTurn = principal >= 0 ? classes[principal].operation.turn : 0;

  const drafts = irreps.map((irrep) => {
    const dimension = irrep.characters[0];
    const twoDimensional = dimension === 2;
    let letter = twoDimensional ? "E" : principal >= 0 && irrep.characters[principal] < 0 ? "B" : "A";
    let subscript = "";
    if (!twoDimensional && built.threeAxes) {
      const [z, y, x] = built.threeAxes.map((index) => irrep.characters[index]);
      subscript = letter === "A" && z > 0 && y > 0 && x > 0 ? "" : z > 0 ? "1" : y > 0 ? "2" : "3";
      letter = subscript === "" ? "A" : "B";
    } else if (!twoDimensional && built.flipClass !== undefined) {
      subscript = irrep.characters[built.flipClass] > 0 ? "1" : "2";
    }
    const decoration =
      inversion >= 0
        ? irrep.characters[inversion] > 0
          ? "g"
          : "u"
        : horizontal >= 0
          ? irrep.characters[horizontal] > 0
            ? "′"
            : "″"
          : "";
    const index = twoDimensional ? twoDimensionalIndex(irrep.characters[principal] / 2, principalTurn) : 0;
    return { letter, subscript, decoration, index };
  });
  return irreps.map((irrep, position) => {
    const draft = drafts[position];
    const shared =
      draft.letter === "E" && drafts.some((other, at) => at !== position && other.letter === "E" && other.decoration === draft.decoration);
    const subscript = shared ? String(draft.index) : draft.subscript;
    return {
      label: `${draft.letter}${subscript}${draft.decoration}`,
      characters: irrep.characters,
      ...(irrep.imaginaryParts ? { imaginaryParts: irrep.imaginaryParts } : {}),
    };
  });
}

/** The smallest non-zero turn about z: proper rotations, and improper ones when there is no i. */
function principalClass(classes: readonly SymmetryClass[], hasInversion: boolean): number {
  let best = -1;
  classes.forEach((c, index) => {
    const op = c.operation;
    if (op.turn === 0 || !isAboutZ(op.axis) || (!op.proper && hasInversion)) return;
    if (best < 0) {
      best = index;
      return;
    }
    const current = classes[best].operation;
    if (op.turn < current.turn - 1e-9 || (Math.abs(op.turn - current.turn) < 1e-9 && op.proper && !current.proper)) best = index;
  });
  return best;
}

/** m where cos(2πm·turn) = cosine, m from 1 to 1/(2·turn). */
function twoDimensionalIndex(cosine: number, turn: number): number {
  if (!(turn > 0)) return 1;
  return Math.max(1, Math.round(Math.acos(Math.max(-1, Math.min(1, cosine))) / (2 * Math.PI * turn)));
}
