// The 3D shape page: draws a shape view model (plain JSON posted by the extension) as a
// ball-and-stick SVG with an orthographic projection, and rotates it by dragging.
// Every piece of text from the document goes in through textContent, never as markup.
// Every message (and the saved state) is checked before it is drawn: anything malformed
// shows "No model" with a reason instead of throwing.
(function () {
  "use strict";

  const SVG = "http://www.w3.org/2000/svg";
  const IDENTITY = [1, 0, 0, 0, 1, 0, 0, 0, 1];
  const DEGREE = Math.PI / 180;
  /** More atoms than any model the extension builds: a message this large is refused unread. */
  const MAX_ATOMS = 20000;
  const host = acquireVsCodeApi();

  const svg = document.getElementById("model");
  const empty = document.getElementById("empty");
  const modeButtons = Array.from(document.querySelectorAll("button[data-mode]"));

  /** @type {{ model: any, problem: any, mode: "molecular" | "electron", rotation: number[] }} */
  const state = restoredState(host.getState());

  function restoredState(saved) {
    const fresh = { model: null, problem: null, mode: "molecular", rotation: startingRotation() };
    if (!isObject(saved)) return fresh;
    const checked = saved.model === null || saved.model === undefined ? { model: null } : checkedModel(saved.model);
    return {
      model: checked.model,
      problem: checked.reason ? noModelProblem(checked.reason) : checkedProblem(saved.problem),
      mode: saved.mode === "electron" ? "electron" : "molecular",
      rotation: isRotation(saved.rotation) ? saved.rotation : fresh.rotation,
    };
  }

  // ----- checking what the extension posts -----
  // A model is drawn only when every part the drawing reads has the right type; the
  // optional parts (angles, centres, warnings, polarity) must be well formed when present.

  function isObject(value) {
    return typeof value === "object" && value !== null && !Array.isArray(value);
  }

  function isFiniteNumber(value) {
    return typeof value === "number" && Number.isFinite(value);
  }

  function isVector(value) {
    return Array.isArray(value) && value.length === 3 && value.every(isFiniteNumber);
  }

  function isIndex(value, count) {
    return Number.isInteger(value) && value >= 0 && value < count;
  }

  function isText(value) {
    return typeof value === "string";
  }

  function optionalList(value) {
    return value === undefined || value === null ? [] : Array.isArray(value) ? value : undefined;
  }

  /** The first thing wrong with an atom, or "" when it can be drawn. */
  function atomFault(atom) {
    if (!isObject(atom)) return "an atom is not an object";
    if (!isText(atom.symbol) || atom.symbol.length === 0) return "an atom has no element symbol";
    if (!isVector(atom.position)) return `atom ${atom.symbol} has no position`;
    if (atom.radius !== undefined && !(isFiniteNumber(atom.radius) && atom.radius > 0)) return `atom ${atom.symbol} has a bad radius`;
    if (atom.colour !== undefined && !isText(atom.colour)) return `atom ${atom.symbol} has a bad colour`;
    return "";
  }

  function bondFault(bond, atomCount) {
    if (!isObject(bond) || !isIndex(bond.from, atomCount) || !isIndex(bond.to, atomCount))
      return "a bond joins atoms that are not in the model";
    if (bond.order !== undefined && !isFiniteNumber(bond.order)) return "a bond has a bad order";
    return "";
  }

  function lonePairFault(lonePair, atomCount) {
    if (!isObject(lonePair) || !isIndex(lonePair.atom, atomCount)) return "a lone pair sits on an atom that is not in the model";
    if (!isVector(lonePair.direction) || !isVector(lonePair.sitePosition)) return "a lone pair has no direction";
    if (lonePair.lobeLength !== undefined && !isFiniteNumber(lonePair.lobeLength)) return "a lone pair has a bad length";
    return "";
  }

  function angleFault(angle) {
    if (!isObject(angle) || !isFiniteNumber(angle.degrees) || !isVector(angle.labelPosition))
      return "an angle has no size or label position";
    if (!Array.isArray(angle.arc) || !angle.arc.every(isVector)) return "an angle has a bad arc";
    return "";
  }

  function centreFault(centre) {
    if (!isObject(centre) || !isText(centre.symbol) || !isText(centre.axe)) return "a centre has no symbol or AXE class";
    for (const key of ["electronGeometry", "molecularGeometry", "hybridization"]) {
      if (!isText(centre[key])) return `centre ${centre.symbol} has no ${key}`;
    }
    if (!isFiniteNumber(centre.stericNumber) || !isFiniteNumber(centre.lonePairs)) return `centre ${centre.symbol} has bad counts`;
    if (!Array.isArray(centre.idealAngles) || !centre.idealAngles.every(isFiniteNumber))
      return `centre ${centre.symbol} has bad ideal angles`;
    return "";
  }

  /** `{ model }` ready to draw, or `{ model: null, reason }` saying what was wrong. */
  function checkedModel(raw) {
    const refuse = (reason) => ({ model: null, reason });
    if (!isObject(raw)) return refuse("the shape data is not an object");
    if (!Array.isArray(raw.atoms) || raw.atoms.length === 0) return refuse("the shape data has no atoms");
    if (raw.atoms.length > MAX_ATOMS) return refuse(`the shape data has more than ${MAX_ATOMS} atoms`);
    if (!isText(raw.title) || !isText(raw.formula)) return refuse("the shape data has no title or formula");
    if (raw.name !== undefined && raw.name !== null && !isText(raw.name)) return refuse("the shape data has a bad name");
    if (raw.extent !== undefined && !isFiniteNumber(raw.extent)) return refuse("the shape data has a bad size");
    const count = raw.atoms.length;
    const bonds = optionalList(raw.bonds);
    const lonePairs = optionalList(raw.lonePairs);
    const angles = optionalList(raw.angles);
    const centres = optionalList(raw.centres);
    const warnings = optionalList(raw.warnings);
    if (!bonds || !lonePairs || !angles || !centres || !warnings) return refuse("a list in the shape data is not a list");
    const fault =
      firstFault(raw.atoms, atomFault) ||
      firstFault(bonds, (bond) => bondFault(bond, count)) ||
      firstFault(lonePairs, (lonePair) => lonePairFault(lonePair, count)) ||
      firstFault(angles, angleFault) ||
      firstFault(centres, centreFault) ||
      firstFault(warnings, (warning) => (isText(warning) ? "" : "a warning is not text"));
    if (fault) return refuse(fault);
    const polarity = raw.polarity;
    if (
      polarity !== undefined &&
      polarity !== null &&
      !(isObject(polarity) && typeof polarity.polar === "boolean" && isText(polarity.reason))
    ) {
      return refuse("the polarity is malformed");
    }
    if (raw.caution !== undefined && !isText(raw.caution)) return refuse("the caution is not text");
    return { model: Object.assign({}, raw, { bonds, lonePairs, angles, centres, warnings, polarity: polarity || null }) };
  }

  function firstFault(list, faultOf) {
    for (const item of list) {
      const fault = faultOf(item);
      if (fault) return fault;
    }
    return "";
  }

  function noModelProblem(reason) {
    return { text: "No model", message: `The shape could not be drawn: ${reason}.` };
  }

  function checkedProblem(raw) {
    if (!isObject(raw)) return null;
    return { text: isText(raw.text) ? raw.text : "", message: isText(raw.message) ? raw.message : "" };
  }

  function startingRotation() {
    // A slight tilt, so a planar or linear species still reads as 3D.
    return multiply(rotationAbout([1, 0, 0], -22 * DEGREE), rotationAbout([0, 1, 0], 28 * DEGREE));
  }

  function save() {
    host.setState(state);
  }

  // ----- small 3x3 matrix helpers (row-major) -----
  function rotationAbout(axis, angle) {
    const [x, y, z] = axis;
    const c = Math.cos(angle);
    const s = Math.sin(angle);
    const t = 1 - c;
    return [
      t * x * x + c,
      t * x * y - s * z,
      t * x * z + s * y,
      t * x * y + s * z,
      t * y * y + c,
      t * y * z - s * x,
      t * x * z - s * y,
      t * y * z + s * x,
      t * z * z + c,
    ];
  }

  function multiply(a, b) {
    const result = new Array(9).fill(0);
    for (let row = 0; row < 3; row++) {
      for (let column = 0; column < 3; column++) {
        for (let k = 0; k < 3; k++) result[row * 3 + column] += a[row * 3 + k] * b[k * 3 + column];
      }
    }
    return result;
  }

  function apply(matrix, v) {
    return [
      matrix[0] * v[0] + matrix[1] * v[1] + matrix[2] * v[2],
      matrix[3] * v[0] + matrix[4] * v[1] + matrix[5] * v[2],
      matrix[6] * v[0] + matrix[7] * v[1] + matrix[8] * v[2],
    ];
  }

  function isRotation(value) {
    return Array.isArray(value) && value.length === 9 && value.every((n) => typeof n === "number" && Number.isFinite(n));
  }

  // ----- drawing -----
  function element(name, attributes) {
    const node = document.createElementNS(SVG, name);
    for (const [key, value] of Object.entries(attributes || {})) node.setAttribute(key, String(value));
    return node;
  }

  function safeColour(colour) {
    return typeof colour === "string" && /^#[0-9a-fA-F]{6}$/.test(colour) ? colour : "#cccccc";
  }

  function number(value, fallback) {
    return typeof value === "number" && Number.isFinite(value) ? value : fallback;
  }

  function vector(value) {
    return Array.isArray(value) && value.length === 3 ? value.map((n) => number(n, 0)) : [0, 0, 0];
  }

  /** Draws the state; should drawing fail all the same, the page says so instead of breaking. */
  function render() {
    try {
      draw();
    } catch (error) {
      state.model = null;
      state.problem = noModelProblem(`drawing failed (${error && error.message ? error.message : String(error)})`);
      draw();
    }
  }

  function draw() {
    while (svg.firstChild) svg.removeChild(svg.firstChild);
    renderLegend();
    const model = state.model;
    const hasModel = Boolean(model && Array.isArray(model.atoms) && model.atoms.length > 0);
    empty.hidden = hasModel;
    svg.classList.toggle("hidden", !hasModel);
    if (!hasModel) return;

    const width = svg.clientWidth || 480;
    const height = svg.clientHeight || 420;
    svg.setAttribute("viewBox", `0 0 ${width} ${height}`);
    const scale = (0.46 * Math.min(width, height)) / Math.max(number(model.extent, 1), 0.5);
    const rotation = isRotation(state.rotation) ? state.rotation : IDENTITY;
    const project = (position) => {
      const [x, y, z] = apply(rotation, vector(position));
      return { x: width / 2 + x * scale, y: height / 2 - y * scale, depth: z };
    };

    const defs = element("defs");
    svg.appendChild(defs);
    const gradientFor = gradientMaker(defs);

    const atoms = model.atoms.map((atom) => ({ atom, screen: project(atom.position) }));
    const items = [];
    for (const bond of Array.isArray(model.bonds) ? model.bonds : []) {
      const from = atoms[bond.from];
      const to = atoms[bond.to];
      if (!from || !to) continue;
      // The stick runs between the balls' surfaces, so it shows only where it leaves a ball.
      const start = vector(from.atom.position);
      const end = vector(to.atom.position);
      const length = Math.hypot(end[0] - start[0], end[1] - start[1], end[2] - start[2]) || 1;
      const along = (t) => start.map((value, k) => value + ((end[k] - start[k]) * t) / length);
      const a = project(along(0.92 * number(from.atom.radius, 0.3)));
      const b = project(along(length - 0.92 * number(to.atom.radius, 0.3)));
      items.push({ depth: (from.screen.depth + to.screen.depth) / 2, draw: () => drawBond(a, b, number(bond.order, 1), scale) });
    }
    const electronView = state.mode === "electron";
    for (const lonePair of Array.isArray(model.lonePairs) ? model.lonePairs : []) {
      const owner = atoms[lonePair.atom];
      if (!owner) continue;
      if (electronView) {
        const site = project(lonePair.sitePosition);
        items.push({ depth: site.depth, draw: () => drawGhostSite(owner, site, scale, lonePair.electrons === 1) });
      } else {
        const direction = apply(rotation, vector(lonePair.direction));
        const length = number(lonePair.lobeLength, 0.7);
        const origin = vector(owner.atom.position);
        const tip = project(origin.map((value, k) => value + vector(lonePair.direction)[k] * length));
        items.push({
          depth: (owner.screen.depth + tip.depth) / 2,
          draw: () => drawLobe(owner, direction, length, scale, lonePair.electrons === 1),
        });
      }
    }
    for (const item of atoms) {
      items.push({ depth: item.screen.depth, draw: () => drawAtom(item, scale, gradientFor) });
    }
    // Painter's order: farthest first (larger depth is nearer the viewer).
    items.sort((a, b) => a.depth - b.depth);
    for (const item of items) svg.appendChild(item.draw());

    for (const angle of Array.isArray(model.angles) ? model.angles : []) svg.appendChild(drawAngle(angle, project));
    // Symbols last, so sticks never cover them; a symbol whose atom is hidden behind a nearer ball is left out.
    for (const item of atoms) {
      if (!hiddenBehindNearerBall(item, atoms, scale)) svg.appendChild(drawAtomLabel(item));
    }
  }

  function gradientMaker(defs) {
    const made = new Map();
    return (colour) => {
      const safe = safeColour(colour);
      if (made.has(safe)) return made.get(safe);
      const id = `shade-${made.size}`;
      const gradient = element("radialGradient", { id, cx: "35%", cy: "32%", r: "70%" });
      gradient.appendChild(element("stop", { offset: "0%", "stop-color": "#ffffff", "stop-opacity": 0.85 }));
      gradient.appendChild(element("stop", { offset: "35%", "stop-color": safe }));
      gradient.appendChild(element("stop", { offset: "100%", "stop-color": safe, "stop-opacity": 1 }));
      defs.appendChild(gradient);
      made.set(safe, id);
      return id;
    };
  }

  function drawAtom(item, scale, gradientFor) {
    const { atom, screen } = item;
    const group = element("g", { class: atom.isCentre ? "atom centre" : "atom" });
    const radius = Math.max(4, number(atom.radius, 0.3) * scale);
    group.appendChild(
      element("circle", { cx: screen.x, cy: screen.y, r: radius, fill: `url(#${gradientFor(atom.colour)})`, class: "ball" }),
    );
    const title = element("title");
    title.textContent = String(atom.symbol);
    group.appendChild(title);
    return group;
  }

  function drawAtomLabel(item) {
    const label = element("text", {
      x: item.screen.x,
      y: item.screen.y,
      class: "atom-label",
      "text-anchor": "middle",
      "dominant-baseline": "central",
    });
    label.textContent = String(item.atom.symbol);
    return label;
  }

  function hiddenBehindNearerBall(item, atoms, scale) {
    return atoms.some(
      (other) =>
        other !== item &&
        other.screen.depth > item.screen.depth &&
        Math.hypot(other.screen.x - item.screen.x, other.screen.y - item.screen.y) < 0.8 * number(other.atom.radius, 0.3) * scale,
    );
  }

  function drawBond(from, to, order, scale) {
    const group = element("g", { class: "bond" });
    const dx = to.x - from.x;
    const dy = to.y - from.y;
    const length = Math.hypot(dx, dy) || 1;
    const offsetX = (-dy / length) * Math.max(3, 0.07 * scale);
    const offsetY = (dx / length) * Math.max(3, 0.07 * scale);
    const count = Math.max(1, Math.min(3, Math.round(order)));
    for (let line = 0; line < count; line++) {
      const shift = line - (count - 1) / 2;
      group.appendChild(
        element("line", {
          x1: from.x + offsetX * shift,
          y1: from.y + offsetY * shift,
          x2: to.x + offsetX * shift,
          y2: to.y + offsetY * shift,
          class: "stick",
          "stroke-width": count === 1 ? Math.max(3, 0.09 * scale) : Math.max(2, 0.05 * scale),
        }),
      );
    }
    return group;
  }

  function drawLobe(owner, rotatedDirection, length, scale, oddElectron) {
    // An ellipse along the projected direction; seen end-on it shrinks to a round blob.
    const along = Math.hypot(rotatedDirection[0], rotatedDirection[1]);
    const reach = length * scale;
    const width = 0.26 * scale;
    const halfLength = Math.max(width, (reach * along) / 2 + width * (1 - along) * 0.6);
    const angle = (Math.atan2(-rotatedDirection[1], rotatedDirection[0]) * 180) / Math.PI;
    const centreX = owner.screen.x + rotatedDirection[0] * (reach / 2);
    const centreY = owner.screen.y - rotatedDirection[1] * (reach / 2);
    const group = element("g", { class: oddElectron ? "odd-electron lobe" : "lone-pair lobe" });
    group.appendChild(
      element("ellipse", {
        cx: centreX,
        cy: centreY,
        rx: halfLength,
        ry: width,
        transform: `rotate(${angle} ${centreX} ${centreY})`,
        class: "lobe-shape",
      }),
    );
    // Two dots side by side across the lobe: the pair of electrons.
    const screenX = along > 1e-6 ? rotatedDirection[0] / along : 1;
    const screenY = along > 1e-6 ? -rotatedDirection[1] / along : 0;
    for (const side of oddElectron ? [0] : [-1, 1]) {
      const dotX = centreX + screenX * reach * 0.12 - screenY * side * width * 0.4;
      const dotY = centreY + screenY * reach * 0.12 + screenX * side * width * 0.4;
      group.appendChild(element("circle", { cx: dotX, cy: dotY, r: Math.max(1.5, 0.045 * scale), class: "electron" }));
    }
    const title = element("title");
    title.textContent = oddElectron ? "odd electron" : "lone pair";
    group.appendChild(title);
    return group;
  }

  function drawGhostSite(owner, site, scale, oddElectron) {
    const group = element("g", { class: oddElectron ? "odd-electron ghost" : "lone-pair ghost" });
    group.appendChild(element("line", { x1: owner.screen.x, y1: owner.screen.y, x2: site.x, y2: site.y, class: "ghost-stick" }));
    group.appendChild(element("circle", { cx: site.x, cy: site.y, r: Math.max(5, 0.24 * scale), class: "ghost-site" }));
    const title = element("title");
    title.textContent = oddElectron ? "odd-electron site" : "lone-pair site";
    group.appendChild(title);
    return group;
  }

  function drawAngle(angle, project) {
    const group = element("g", { class: "angle" });
    const points = (Array.isArray(angle.arc) ? angle.arc : []).map(project);
    if (points.length > 1) {
      group.appendChild(
        element("polyline", { points: points.map((p) => `${p.x.toFixed(1)},${p.y.toFixed(1)}`).join(" "), class: "angle-arc" }),
      );
    }
    const at = project(angle.labelPosition);
    const label = element("text", { x: at.x, y: at.y, class: "angle-label", "text-anchor": "middle", "dominant-baseline": "central" });
    label.textContent = `${number(angle.degrees, 0).toFixed(1)}°`;
    group.appendChild(label);
    return group;
  }

  // ----- legend -----
  function text(id, value) {
    document.getElementById(id).textContent = value;
  }

  function renderLegend() {
    const model = state.model;
    const problem = state.problem;
    for (const button of modeButtons) button.setAttribute("aria-pressed", String(button.dataset.mode === state.mode));
    const centres = document.getElementById("centres");
    while (centres.firstChild) centres.removeChild(centres.firstChild);
    const warnings = document.getElementById("warnings");
    while (warnings.firstChild) warnings.removeChild(warnings.firstChild);
    if (!model) {
      text("title", problem ? String(problem.text || "No model") : "No species");
      text("subtitle", problem ? String(problem.message) : "");
      text("mode-note", "");
      text("polarity", "");
      text("caution", "");
      return;
    }
    text("title", String(model.title));
    const subtitle = [model.formula !== model.title ? model.formula : "", model.name || ""].filter(Boolean).join(" · ");
    text("subtitle", subtitle);
    text(
      "mode-note",
      state.mode === "electron"
        ? "Lone pairs shown as empty sites: the arrangement of all electron domains."
        : "Atoms only, lone pairs as lobes: the shape the atoms make.",
    );
    for (const centre of Array.isArray(model.centres) ? model.centres : []) centres.appendChild(centreEntry(centre));
    text("polarity", model.polarity ? `${model.polarity.polar ? "Polar" : "Nonpolar"}: ${model.polarity.reason}` : "");
    for (const warning of Array.isArray(model.warnings) ? model.warnings : []) {
      const item = document.createElement("li");
      item.textContent = String(warning);
      warnings.appendChild(item);
    }
    text("caution", String(model.caution || ""));
  }

  function centreEntry(centre) {
    const section = document.createElement("section");
    section.className = "centre-entry";
    const heading = document.createElement("h2");
    heading.textContent = `Centre ${centre.symbol}: ${centre.axe}`;
    section.appendChild(heading);
    const list = document.createElement("dl");
    const rows = [
      ["AXE class", centre.axe, "axe"],
      ["Electron geometry", centre.electronGeometry, state.mode === "electron" ? "current" : ""],
      ["Molecular geometry", centre.molecularGeometry, state.mode === "molecular" ? "current" : ""],
      ["Hybridization", centre.hybridization, ""],
      ["Steric number", centre.stericNumber, ""],
      ["Lone pairs", centre.lonePairs, ""],
      ["Ideal angles", (Array.isArray(centre.idealAngles) ? centre.idealAngles : []).map((a) => `${a}°`).join(", "), ""],
    ];
    for (const [term, value, mark] of rows) {
      const dt = document.createElement("dt");
      dt.textContent = term;
      const dd = document.createElement("dd");
      dd.textContent = String(value);
      if (mark) dd.className = mark;
      list.appendChild(dt);
      list.appendChild(dd);
    }
    section.appendChild(list);
    return section;
  }

  // ----- interaction -----
  function rotateBy(aboutScreenY, aboutScreenX) {
    const turn = multiply(rotationAbout([1, 0, 0], aboutScreenX), rotationAbout([0, 1, 0], aboutScreenY));
    state.rotation = multiply(turn, isRotation(state.rotation) ? state.rotation : IDENTITY);
    render();
  }

  let drag = null;
  svg.addEventListener("pointerdown", (event) => {
    drag = { x: event.clientX, y: event.clientY };
    svg.setPointerCapture(event.pointerId);
  });
  svg.addEventListener("pointermove", (event) => {
    if (!drag) return;
    const dx = event.clientX - drag.x;
    const dy = event.clientY - drag.y;
    drag = { x: event.clientX, y: event.clientY };
    rotateBy(dx * 0.01, dy * 0.01);
  });
  const endDrag = () => {
    if (drag) save();
    drag = null;
  };
  svg.addEventListener("pointerup", endDrag);
  svg.addEventListener("pointercancel", endDrag);
  svg.addEventListener("keydown", (event) => {
    const step = 8 * DEGREE;
    const turns = { ArrowLeft: [-step, 0], ArrowRight: [step, 0], ArrowUp: [0, -step], ArrowDown: [0, step] };
    if (turns[event.key]) {
      rotateBy(turns[event.key][0], turns[event.key][1]);
      save();
      event.preventDefault();
    } else if (event.key === "r" || event.key === "R") {
      state.rotation = startingRotation();
      render();
      save();
    }
  });
  for (const button of modeButtons) {
    button.addEventListener("click", () => {
      state.mode = button.dataset.mode === "electron" ? "electron" : "molecular";
      render();
      save();
      host.postMessage({ type: "mode", mode: state.mode });
    });
  }
  window.addEventListener("resize", render);

  window.addEventListener("message", (event) => {
    const message = event.data;
    if (!isObject(message)) return;
    if (message.type === "show") {
      const checked = checkedModel(message.model);
      state.model = checked.model;
      state.problem = checked.reason ? noModelProblem(checked.reason) : null;
    } else if (message.type === "problem") {
      state.model = null;
      state.problem = checkedProblem(message);
    } else if (message.type === "clear") {
      state.model = null;
      state.problem = null;
    } else {
      return;
    }
    render();
    save();
  });

  render();
  host.postMessage({ type: "ready" });
})();
