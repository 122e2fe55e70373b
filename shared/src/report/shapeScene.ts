/**
 * The one ball-and-stick renderer: turns a shape view model, a rotation and a pane size into a
 * scene (SVG elements as plain data, painted back to front). The 3D page builds DOM nodes from
 * the scene; the hover sketch and the command line write it out with `sceneSvg`. Every colour is
 * an attribute, so an exported file looks the same outside the editor. Free of chemistry: it
 * reads only the view model's plain data, so the page's browser bundle stays small.
 */
import { contrastRatio, isHexColour, mixColours } from "./colourMath";
import type { ShapeViewModel } from "./shapeViewModel";

type Vec3 = readonly [number, number, number];

/** One SVG element as data. Text is plain text, never markup. */
export interface SceneNode {
  readonly tag: string;
  readonly attributes: Readonly<Record<string, string | number>>;
  readonly text?: string;
  readonly children?: readonly SceneNode[];
}

/** Colours that follow the editor theme. */
export interface SceneTheme {
  /** Text of angle labels. */
  readonly foreground: string;
  /** The pane's background: far atoms fade towards it, label halos are painted with it. */
  readonly background: string;
}

/** Where the model sits on screen: pixels per ångström and the screen point of the model's origin. */
export interface SceneFrame {
  readonly scale: number;
  readonly originX: number;
  readonly originY: number;
}

export interface SceneOptions {
  readonly width: number;
  readonly height: number;
  /** Row-major 3×3; defaults to the model's starting view. */
  readonly rotation?: readonly number[];
  /** Lone pairs as lobes ("molecular") or as empty electron sites ("electron"). */
  readonly mode?: "molecular" | "electron";
  /** Element symbols on the balls that are big enough to hold them (default true). */
  readonly atomLabels?: boolean;
  /** Labelled bond angles (default true). */
  readonly angleLabels?: boolean;
  /** Short markup for hover cards: no groups, titles, highlights or electron dots (default false). */
  readonly compact?: boolean;
  /** Defaults to a neutral theme that reads on light and dark backgrounds. */
  readonly theme?: SceneTheme;
  /** Keep this scale and origin (while the user turns the model) instead of fitting the pane. */
  readonly frame?: SceneFrame;
  /** Fewest pixels kept clear at each edge; defaults to 6% of the smaller side, at least 6. */
  readonly margin?: number;
}

/** A placed atom or label, in pixels, for callers that check the layout. */
export interface PlacedCircle {
  readonly index: number;
  readonly x: number;
  readonly y: number;
  readonly radius: number;
}

export interface PlacedBox {
  readonly x: number;
  readonly y: number;
  readonly width: number;
  readonly height: number;
}

/** A drawn scene: the SVG root's children and the layout it settled on. */
export interface ShapeScene {
  readonly width: number;
  readonly height: number;
  readonly frame: SceneFrame;
  readonly nodes: readonly SceneNode[];
  readonly atoms: readonly PlacedCircle[];
  readonly angleLabels: readonly PlacedBox[];
}

/** Reads on both a white page and a dark editor. */
export const NEUTRAL_THEME: SceneTheme = { foreground: "#707070", background: "#8c8c8c" };

const BOND_COLOUR = "#8c8c8c";
const LOBE_COLOUR = "#5b8de0";
const ARC_COLOUR = "#e0782c";
const FALLBACK_FILL = "#8a8a8a";
/** Near atoms are drawn up to this much larger, far ones this much smaller. */
const NEAR_GROWTH = 0.12;
/** How far a far atom fades towards the background. */
const FAR_FADE = 0.38;
const LABEL_FONT = "system-ui, -apple-system, 'Segoe UI', sans-serif";
const ANGLE_FONT_SIZE = 12;
/** Labels are found at least this far (pixels) from balls, bonds and each other. */
const LABEL_CLEARANCE = 3;
/** No atom labels on balls smaller than this (pixels). */
const MIN_LABELLED_RADIUS = 7;

interface Projected {
  readonly x: number;
  readonly y: number;
  readonly depth: number;
}

interface Painted {
  readonly depth: number;
  readonly node: SceneNode;
}

/** The scene of `model` in a pane of the given size. Never throws on a well-typed model. */
export function shapeScene(model: ShapeViewModel, options: SceneOptions): ShapeScene {
  const width = Math.max(40, options.width);
  const height = Math.max(40, options.height);
  const rotation = isRotation(options.rotation) ? options.rotation : isRotation(model.viewRotation) ? model.viewRotation : IDENTITY;
  const mode = options.mode ?? "molecular";
  const compact = options.compact ?? false;
  const theme = options.theme ?? NEUTRAL_THEME;
  const turn = (point: Vec3): Vec3 => [
    rotation[0] * point[0] + rotation[1] * point[1] + rotation[2] * point[2],
    rotation[3] * point[0] + rotation[4] * point[1] + rotation[5] * point[2],
    rotation[6] * point[0] + rotation[7] * point[1] + rotation[8] * point[2],
  ];

  const atomDepths = model.atoms.map((atom) => turn(atom.position)[2]);
  const deepest = Math.max(0.5, ...atomDepths.map(Math.abs));
  const nearness = (depth: number): number => Math.max(0, Math.min(1, (depth + deepest) / (2 * deepest)));
  const growth = (depth: number): number => 1 - NEAR_GROWTH + 2 * NEAR_GROWTH * nearness(depth);
  const lonePairs = model.lonePairs.filter((lonePair) => model.atoms[lonePair.atom]);

  const frame = options.frame ?? fitFrame(model, turn, growth, mode, width, height, options.margin);
  const project = (point: Vec3): Projected => {
    const [x, y, depth] = turn(point);
    return { x: frame.originX + x * frame.scale, y: frame.originY - y * frame.scale, depth };
  };

  const atoms = model.atoms.map((atom, index) => {
    const at = project(atom.position);
    return { index, atom, at, radius: Math.max(2, atom.radius * growth(at.depth) * frame.scale) };
  });
  const painted: Painted[] = [];
  const bondWidth = clamp(0.085 * frame.scale, 1.2, 7);

  const bondSegments: [Projected, Projected][] = [];
  for (const [bondIndex, bond] of model.bonds.entries()) {
    const from = atoms[bond.from];
    const to = atoms[bond.to];
    if (!from || !to) continue;
    bondSegments.push([from.at, to.at]);
    const middle: Projected = { x: (from.at.x + to.at.x) / 2, y: (from.at.y + to.at.y) / 2, depth: 0 };
    // Each half is painted just behind its own ball: a ball always covers the ends of its bonds,
    // and a bond running towards the viewer is never hidden by the atom it leaves.
    for (const end of [from, to]) {
      painted.push({ depth: end.at.depth - 1e-3, node: bondNode(end.at, middle, bond.order ?? 1, bondWidth, compact, bondIndex) });
    }
  }

  for (const lonePair of lonePairs) {
    const owner = atoms[lonePair.atom];
    if (mode === "electron") {
      const site = project(lonePair.sitePosition);
      painted.push({ depth: site.depth, node: ghostSiteNode(owner.at, site, frame.scale, lonePair.electrons === 1, compact) });
    } else {
      const direction = turn(lonePair.direction);
      const length = (lonePair.lobeLength ?? 0.7) * frame.scale;
      painted.push({
        depth: owner.at.depth + direction[2] * 0.35,
        node: lobeNode(owner.at, direction, length, frame.scale, lonePair.electrons === 1, compact),
      });
    }
  }

  const highlightId = "lonepair-highlight";
  // A hover sketch is too small for fading to read; there size and painting order show depth.
  const fadeOf = (depth: number): number => (compact ? 0 : FAR_FADE * (1 - nearness(depth)));
  for (const item of atoms) {
    const fade = fadeOf(item.at.depth);
    const fill = mixColours(isHexColour(item.atom.colour) ? item.atom.colour : FALLBACK_FILL, fadeTarget(theme), fade);
    const outline = isHexColour(item.atom.outline) ? item.atom.outline : "#333333";
    painted.push({ depth: item.at.depth, node: atomNode(item, fill, outline, highlightId, compact) });
  }
  painted.sort((a, b) => a.depth - b.depth);

  const nodes: SceneNode[] = [];
  if (!compact) {
    nodes.push({
      tag: "defs",
      attributes: {},
      children: [
        {
          tag: "radialGradient",
          attributes: { id: highlightId, cx: "0.36", cy: "0.32", r: "0.62" },
          children: [
            { tag: "stop", attributes: { offset: "0", "stop-color": "#ffffff", "stop-opacity": "0.75" } },
            { tag: "stop", attributes: { offset: "1", "stop-color": "#ffffff", "stop-opacity": "0" } },
          ],
        },
      ],
    });
  }
  if (compact) {
    // One group carries the bonds' stroke, so each of the many lines stays short.
    nodes.push({
      tag: "g",
      attributes: { stroke: BOND_COLOUR, "stroke-width": round(bondWidth), "stroke-linecap": "round" },
      children: painted.map((item) => item.node),
    });
  } else nodes.push(...painted.map((item) => item.node));

  // Symbols go over everything, except on a ball a nearer ball covers.
  if ((options.atomLabels ?? true) && model.atoms.length > 0) {
    for (const item of atoms) {
      if (item.radius < MIN_LABELLED_RADIUS || coveredByNearer(item, atoms)) continue;
      const fill = mixColours(isHexColour(item.atom.colour) ? item.atom.colour : FALLBACK_FILL, fadeTarget(theme), fadeOf(item.at.depth));
      nodes.push(atomLabelNode(item, inkFor(fill), compact));
    }
  }

  const placedLabels: PlacedBox[] = [];
  if ((options.angleLabels ?? true) && !compact) {
    const circles = atoms.map((item) => ({ x: item.at.x, y: item.at.y, radius: item.radius }));
    for (const angle of model.angles) {
      const centre = atoms[angle.centre];
      if (!centre) continue;
      const arc = angle.arc.map(project);
      const text = `${angle.degrees.toFixed(1)}°`;
      const box = placeAngleLabel(centre.at, arc, text, circles, bondSegments, placedLabels, width, height);
      nodes.push(angleNode(arc, text, box, theme));
      if (box) placedLabels.push(box);
    }
  }

  return {
    width,
    height,
    frame,
    nodes,
    atoms: atoms.map((item) => ({ index: item.index, x: item.at.x, y: item.at.y, radius: item.radius })),
    angleLabels: placedLabels,
  };
}

/** Words a standalone picture carries for readers and screen readers. */
export interface SceneCaption {
  readonly title?: string;
  readonly description?: string;
}

/** The scene as a standalone SVG document: colours inline, text escaped. */
export function sceneSvg(scene: ShapeScene, background?: string, caption: SceneCaption = {}): string {
  const backdrop = background && isHexColour(background) ? `<rect width="100%" height="100%" fill="${background}"/>` : "";
  const words =
    (caption.title ? `<title>${escapeXml(caption.title)}</title>` : "") +
    (caption.description ? `<desc>${escapeXml(caption.description)}</desc>` : "");
  return (
    `<svg xmlns="http://www.w3.org/2000/svg" width="${scene.width}" height="${scene.height}" viewBox="0 0 ${scene.width} ${scene.height}">` +
    words +
    backdrop +
    scene.nodes.map(nodeMarkup).join("") +
    "</svg>"
  );
}

/** Pixels per ångström and origin that fit the model's drawing, centred, inside the margins. */
function fitFrame(
  model: ShapeViewModel,
  turn: (point: Vec3) => Vec3,
  growth: (depth: number) => number,
  mode: "molecular" | "electron",
  width: number,
  height: number,
  askedMargin: number | undefined,
): SceneFrame {
  let left = Infinity;
  let right = -Infinity;
  let bottom = Infinity;
  let top = -Infinity;
  const include = (point: Vec3, radius: number): void => {
    left = Math.min(left, point[0] - radius);
    right = Math.max(right, point[0] + radius);
    bottom = Math.min(bottom, point[1] - radius);
    top = Math.max(top, point[1] + radius);
  };
  for (const atom of model.atoms) {
    const at = turn(atom.position);
    include(at, atom.radius * growth(at[2]));
  }
  for (const lonePair of model.lonePairs) {
    const owner = model.atoms[lonePair.atom];
    if (!owner) continue;
    if (mode === "electron") include(turn(lonePair.sitePosition), 0.26);
    else {
      const reach = lonePair.lobeLength ?? 0.7;
      const tip: Vec3 = [
        owner.position[0] + lonePair.direction[0] * reach,
        owner.position[1] + lonePair.direction[1] * reach,
        owner.position[2] + lonePair.direction[2] * reach,
      ];
      include(turn(tip), 0.12);
    }
  }
  for (const angle of model.angles) for (const point of angle.arc) include(turn(point), 0.05);
  if (!Number.isFinite(left)) return { scale: 40, originX: width / 2, originY: height / 2 };
  const margin = askedMargin ?? Math.max(6, 0.06 * Math.min(width, height));
  const spanX = Math.max(right - left, 0.5);
  const spanY = Math.max(top - bottom, 0.5);
  // A two-atom molecule would otherwise become two giant balls.
  const largest = 0.42 * Math.min(width, height);
  const scale = Math.min(largest, (width - 2 * margin) / spanX, (height - 2 * margin) / spanY);
  return {
    scale,
    originX: width / 2 - ((left + right) / 2) * scale,
    originY: height / 2 + ((bottom + top) / 2) * scale,
  };
}

function fadeTarget(theme: SceneTheme): string {
  return isHexColour(theme.background) ? theme.background : NEUTRAL_THEME.background;
}

function inkFor(fill: string): string {
  return contrastRatio(fill, "#000000") >= contrastRatio(fill, "#ffffff") ? "#000000" : "#ffffff";
}

function coveredByNearer(
  item: { at: Projected; index: number },
  atoms: readonly { at: Projected; radius: number; index: number }[],
): boolean {
  return atoms.some(
    (other) =>
      other.index !== item.index &&
      other.at.depth > item.at.depth &&
      Math.hypot(other.at.x - item.at.x, other.at.y - item.at.y) < other.radius,
  );
}

function bondNode(from: Projected, to: Projected, order: number, bondWidth: number, compact: boolean, index: number): SceneNode {
  const dx = to.x - from.x;
  const dy = to.y - from.y;
  const length = Math.hypot(dx, dy);
  const lines = Math.max(1, Math.min(3, Math.round(order)));
  // A compact scene's lines take colour, cap and the single-bond width from the group round them.
  const lineNode = (x1: number, y1: number, x2: number, y2: number, strokeWidth: number): SceneNode => ({
    tag: "line",
    attributes: {
      x1: round(x1),
      y1: round(y1),
      x2: round(x2),
      y2: round(y2),
      ...(compact ? {} : { stroke: BOND_COLOUR, "stroke-linecap": "round" }),
      ...(compact && strokeWidth === bondWidth ? {} : { "stroke-width": round(strokeWidth) }),
    },
  });
  let children: SceneNode[];
  // Seen end-on a bond has no sideways direction for parallel lines; one thick line stands in.
  if (lines === 1 || length < 1) children = [lineNode(from.x, from.y, to.x, to.y, lines === 1 ? bondWidth : bondWidth * 1.6)];
  else {
    const thin = Math.max(1, bondWidth * 0.62);
    const gap = thin * 2.2;
    const normalX = (-dy / length) * gap;
    const normalY = (dx / length) * gap;
    children = Array.from({ length: lines }, (_, line) => {
      const offset = line - (lines - 1) / 2;
      return lineNode(from.x + normalX * offset, from.y + normalY * offset, to.x + normalX * offset, to.y + normalY * offset, thin);
    });
  }
  if (compact && children.length === 1) return children[0];
  // Drawn in two halves: `data-bond` ties both to the one bond.
  return { tag: "g", attributes: compact ? {} : { class: "bond", "data-bond": index }, children };
}

function atomNode(
  item: { atom: ShapeViewModel["atoms"][number]; at: Projected; radius: number },
  fill: string,
  outline: string,
  highlightId: string,
  compact: boolean,
): SceneNode {
  const ball: SceneNode = {
    tag: "circle",
    attributes: {
      ...(compact ? {} : { class: "ball" }),
      cx: round(item.at.x),
      cy: round(item.at.y),
      r: round(item.radius),
      fill,
      stroke: outline,
      "stroke-width": round(clamp(item.radius * 0.09, 0.8, 2)),
    },
  };
  if (compact) return ball;
  const highlight: SceneNode = {
    tag: "circle",
    attributes: { class: "highlight", cx: round(item.at.x), cy: round(item.at.y), r: round(item.radius), fill: `url(#${highlightId})` },
  };
  return {
    tag: "g",
    attributes: { class: item.atom.isCentre ? "atom centre" : "atom", "data-atom": item.atom.index },
    children: [ball, highlight, { tag: "title", attributes: {}, text: String(item.atom.symbol) }],
  };
}

function atomLabelNode(
  item: { atom: ShapeViewModel["atoms"][number]; at: Projected; radius: number },
  ink: string,
  compact: boolean,
): SceneNode {
  const symbol = String(item.atom.symbol);
  const size = Math.min(item.radius * (symbol.length > 1 ? 0.95 : 1.15), 18);
  return {
    tag: "text",
    attributes: {
      ...(compact ? {} : { class: "atom-label", "data-atom": item.atom.index }),
      x: round(item.at.x),
      y: round(item.at.y + size * 0.35),
      "font-family": LABEL_FONT,
      "font-size": round(size),
      "font-weight": "600",
      "text-anchor": "middle",
      fill: ink,
    },
    text: symbol,
  };
}

function lobeNode(owner: Projected, direction: Vec3, length: number, scale: number, oddElectron: boolean, compact: boolean): SceneNode {
  // An ellipse along the projected direction; seen end-on it shrinks to a round blob.
  const sideways = Math.hypot(direction[0], direction[1]);
  const width = (oddElectron ? 0.16 : 0.24) * scale;
  const halfLength = Math.max(width, (length * sideways) / 2);
  const angle = (Math.atan2(-direction[1], direction[0]) * 180) / Math.PI;
  const centreX = owner.x + direction[0] * (length / 2);
  const centreY = owner.y - direction[1] * (length / 2);
  const lobe: SceneNode = {
    tag: "ellipse",
    attributes: {
      ...(compact ? {} : { class: "lobe-shape" }),
      cx: round(centreX),
      cy: round(centreY),
      rx: round(halfLength),
      ry: round(width),
      transform: `rotate(${round(angle)} ${round(centreX)} ${round(centreY)})`,
      fill: LOBE_COLOUR,
      "fill-opacity": "0.3",
      stroke: LOBE_COLOUR,
      "stroke-width": compact ? "0.8" : "1.2",
    },
  };
  if (compact) return lobe;
  const screenX = sideways > 1e-6 ? direction[0] / sideways : 1;
  const screenY = sideways > 1e-6 ? -direction[1] / sideways : 0;
  const dots = (oddElectron ? [0] : [-1, 1]).map((side): SceneNode => ({
    tag: "circle",
    attributes: {
      class: "electron",
      cx: round(centreX + screenX * length * 0.12 - screenY * side * width * 0.4),
      cy: round(centreY + screenY * length * 0.12 + screenX * side * width * 0.4),
      r: round(Math.max(1.5, 0.045 * scale)),
      fill: LOBE_COLOUR,
    },
  }));
  return {
    tag: "g",
    attributes: { class: oddElectron ? "odd-electron lobe" : "lone-pair lobe" },
    children: [lobe, ...dots, { tag: "title", attributes: {}, text: oddElectron ? "odd electron" : "lone pair" }],
  };
}

function ghostSiteNode(owner: Projected, site: Projected, scale: number, oddElectron: boolean, compact: boolean): SceneNode {
  const children: SceneNode[] = [
    {
      tag: "line",
      attributes: {
        x1: round(owner.x),
        y1: round(owner.y),
        x2: round(site.x),
        y2: round(site.y),
        stroke: LOBE_COLOUR,
        "stroke-width": "2",
        "stroke-dasharray": "5 4",
      },
    },
    {
      tag: "circle",
      attributes: {
        cx: round(site.x),
        cy: round(site.y),
        r: round(Math.max(5, 0.24 * scale)),
        fill: LOBE_COLOUR,
        "fill-opacity": "0.12",
        stroke: LOBE_COLOUR,
        "stroke-width": "1.5",
        "stroke-dasharray": "4 3",
      },
    },
  ];
  if (!compact) children.push({ tag: "title", attributes: {}, text: oddElectron ? "odd-electron site" : "lone-pair site" });
  return { tag: "g", attributes: compact ? {} : { class: oddElectron ? "odd-electron ghost" : "lone-pair ghost" }, children };
}

function angleNode(arc: readonly Projected[], text: string, box: PlacedBox | undefined, theme: SceneTheme): SceneNode {
  const children: SceneNode[] = [];
  if (arc.length > 1) {
    children.push({
      tag: "polyline",
      attributes: {
        class: "angle-arc",
        points: arc.map((point) => `${round(point.x)},${round(point.y)}`).join(" "),
        fill: "none",
        stroke: ARC_COLOUR,
        "stroke-width": "1.5",
      },
    });
  }
  if (box) {
    const middle = arc[Math.floor(arc.length / 2)];
    const labelX = box.x + box.width / 2;
    const labelY = box.y + box.height / 2;
    // A label pushed away from its arc keeps a thin leader back to it.
    if (middle && Math.hypot(labelX - middle.x, labelY - middle.y) > box.height * 1.6) {
      const towards = nearestPointOnBox(box, middle);
      children.push({
        tag: "line",
        attributes: {
          class: "angle-leader",
          x1: round(middle.x),
          y1: round(middle.y),
          x2: round(towards.x),
          y2: round(towards.y),
          stroke: ARC_COLOUR,
          "stroke-width": "0.8",
          "stroke-dasharray": "2 2",
        },
      });
    }
    children.push({
      tag: "text",
      attributes: {
        class: "angle-label",
        x: round(labelX),
        y: round(labelY + ANGLE_FONT_SIZE * 0.35),
        "font-family": LABEL_FONT,
        "font-size": ANGLE_FONT_SIZE,
        "text-anchor": "middle",
        fill: isHexColour(theme.foreground) ? theme.foreground : NEUTRAL_THEME.foreground,
      },
      text,
    });
  }
  return { tag: "g", attributes: { class: "angle" }, children };
}

/**
 * A box for an angle label clear of every ball, bond and earlier label, inside the pane: tried
 * outwards from the arc's middle along the bisector, then turned a little either way.
 */
function placeAngleLabel(
  centre: Projected,
  arc: readonly Projected[],
  text: string,
  circles: readonly { x: number; y: number; radius: number }[],
  segments: readonly (readonly [Projected, Projected])[],
  labels: readonly PlacedBox[],
  width: number,
  height: number,
): PlacedBox | undefined {
  const boxWidth = text.length * ANGLE_FONT_SIZE * 0.62 + 4;
  const boxHeight = ANGLE_FONT_SIZE * 1.3;
  const middle = arc[Math.floor(arc.length / 2)] ?? centre;
  let baseAngle = Math.atan2(middle.y - centre.y, middle.x - centre.x);
  if (!Number.isFinite(baseAngle) || Math.hypot(middle.y - centre.y, middle.x - centre.x) < 1) baseAngle = -Math.PI / 2;
  const start = Math.max(4, Math.hypot(middle.x - centre.x, middle.y - centre.y));
  const reach = Math.max(width, height);
  for (let distance = start; distance < reach; distance += 6) {
    for (const turnDegrees of [0, 12, -12, 24, -24, 36, -36, 50, -50, 65, -65, 80, -80]) {
      const angle = baseAngle + (turnDegrees * Math.PI) / 180;
      const cx = centre.x + Math.cos(angle) * (distance + boxHeight / 2);
      const cy = centre.y + Math.sin(angle) * (distance + boxHeight / 2);
      const box: PlacedBox = { x: cx - boxWidth / 2, y: cy - boxHeight / 2, width: boxWidth, height: boxHeight };
      if (box.x < 2 || box.y < 2 || box.x + box.width > width - 2 || box.y + box.height > height - 2) continue;
      if (circles.some((circle) => boxTouchesCircle(box, circle, LABEL_CLEARANCE))) continue;
      if (segments.some(([a, b]) => boxTouchesSegment(box, a, b, LABEL_CLEARANCE))) continue;
      if (labels.some((other) => boxesOverlap(box, other, LABEL_CLEARANCE))) continue;
      return { x: round(box.x), y: round(box.y), width: round(box.width), height: round(box.height) };
    }
  }
  return undefined;
}

function boxTouchesCircle(box: PlacedBox, circle: { x: number; y: number; radius: number }, clearance: number): boolean {
  const nearestX = clamp(circle.x, box.x, box.x + box.width);
  const nearestY = clamp(circle.y, box.y, box.y + box.height);
  return Math.hypot(circle.x - nearestX, circle.y - nearestY) < circle.radius + clearance;
}

function boxTouchesSegment(box: PlacedBox, a: Projected, b: Projected, clearance: number): boolean {
  // Sampled along the bond: a box is never thinner than a few pixels, so steps of 2 px cannot miss it.
  const length = Math.hypot(b.x - a.x, b.y - a.y);
  const steps = Math.max(1, Math.ceil(length / 2));
  for (let step = 0; step <= steps; step++) {
    const x = a.x + ((b.x - a.x) * step) / steps;
    const y = a.y + ((b.y - a.y) * step) / steps;
    if (x > box.x - clearance && x < box.x + box.width + clearance && y > box.y - clearance && y < box.y + box.height + clearance)
      return true;
  }
  return false;
}

function boxesOverlap(a: PlacedBox, b: PlacedBox, clearance: number): boolean {
  return (
    a.x < b.x + b.width + clearance &&
    b.x < a.x + a.width + clearance &&
    a.y < b.y + b.height + clearance &&
    b.y < a.y + a.height + clearance
  );
}

function nearestPointOnBox(box: PlacedBox, point: { x: number; y: number }): { x: number; y: number } {
  return { x: clamp(point.x, box.x, box.x + box.width), y: clamp(point.y, box.y, box.y + box.height) };
}

const IDENTITY = [1, 0, 0, 0, 1, 0, 0, 0, 1] as const;

function isRotation(value: unknown): value is readonly number[] {
  return Array.isArray(value) && value.length === 9 && value.every((n) => typeof n === "number" && Number.isFinite(n));
}

function nodeMarkup(node: SceneNode): string {
  const attributes = Object.entries(node.attributes)
    .map(([key, value]) => ` ${key}="${escapeXml(String(value))}"`)
    .join("");
  const inner = (node.text !== undefined ? escapeXml(node.text) : "") + (node.children ?? []).map(nodeMarkup).join("");
  return inner ? `<${node.tag}${attributes}>${inner}</${node.tag}>` : `<${node.tag}${attributes}/>`;
}

function escapeXml(text: string): string {
  return text.replace(/&/g, "&amp;").replace(/</g, "&lt;").replace(/>/g, "&gt;").replace(/"/g, "&quot;");
}

/** One decimal: finer than a pixel needs, and short markup. */
function round(value: number): number {
  const rounded = Math.round(value * 10) / 10;
  return rounded === 0 ? 0 : rounded;
}

function clamp(value: number, low: number, high: number): number {
  return Math.max(low, Math.min(high, value));
}
