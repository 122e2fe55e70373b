// The 3D shape page: draws a shape view model (plain JSON posted by the extension) with the
// core's ball-and-stick renderer (dist/webview/shapeScene.js, loaded first), fits it to the
// pane as the pane resizes, rotates it by dragging, and saves the current view as SVG.
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
  const renderer = globalThis.lonepairShapeScene;

  const svg = document.getElementById("model");
  const empty = document.getElementById("empty");
  const modeButtons = Array.from(document.querySelectorAll("button[data-mode]"));
  const saveButton = document.getElementById("save-svg");
  /** The scene last drawn: what "Save view as SVG" writes. */
  let lastScene = null;
  /** Scale and origin held while the user turns the model, so it does not zoom as it turns. */
  let heldFrame = null;

  /** @type {{ model: any, problem: any, mode: "molecular" | "electron", rotation: number[] }} */
  const state = restoredState(host.getState());

  function restoredState(saved) {
    const fresh = { model: null, problem: null, mode: "molecular", rotation: IDENTITY, lewis: null };
    if (!isObject(saved)) return fresh;
    const checked = saved.model === null || saved.model === undefined ? { model: null } : checkedModel(saved.model);
    return {
      model: checked.model,
      problem: checked.reason ? noModelProblem(checked.reason) : checkedProblem(saved.problem),
      mode: saved.mode === "electron" ? "electron" : "molecular",
      rotation: isRotation(saved.rotation) ? saved.rotation : startingRotation(checked.model),
      lewis: checked.model ? checkedLewis(saved.lewis) : null,
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
    for (const key of ["colour", "outline", "ink"]) {
      if (atom[key] !== undefined && !isText(atom[key])) return `atom ${atom.symbol} has a bad ${key}`;
    }
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
    if (raw.viewRotation !== undefined && !isRotation(raw.viewRotation)) return refuse("the shape data has a bad starting view");
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

  /** The Lewis diagram's two images: only SVG data URIs of a sane size, and text for the alt. */
  function checkedLewis(raw) {
    if (!isObject(raw) || !isText(raw.altText)) return null;
    const image = (uri) => isText(uri) && uri.startsWith("data:image/svg+xml;base64,") && uri.length < 400000;
    return image(raw.light) && image(raw.dark) ? { light: raw.light, dark: raw.dark, altText: raw.altText } : null;
  }

  function checkedProblem(raw) {
    if (!isObject(raw)) return null;
    return { text: isText(raw.text) ? raw.text : "", message: isText(raw.message) ? raw.message : "" };
  }

  /** The view the core chose from the model's symmetry, the same one the hover sketch shows. */
  function startingRotation(model) {
    return model && isRotation(model.viewRotation) ? model.viewRotation.slice() : IDENTITY.slice();
  }

  function save() {
    host.setState(state);
  }

  /** The editor theme's text and background colours as #rrggbb, for labels and depth fading. */
  function themeColours() {
    const style = getComputedStyle(document.body);
    return { foreground: hexOf(style.color, "#d4d4d4"), background: hexOf(style.backgroundColor, "#1e1e1e") };
  }

  function hexOf(cssColour, fallback) {
    const match = /^rgba?\((\d+),\s*(\d+),\s*(\d+)(?:,\s*([\d.]+))?\)$/.exec(String(cssColour).trim());
    if (!match || match[4] === "0") return fallback;
    return `#${[match[1], match[2], match[3]].map((n) => Number(n).toString(16).padStart(2, "0")).join("")}`;
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

  function isRotation(value) {
    return Array.isArray(value) && value.length === 9 && value.every((n) => typeof n === "number" && Number.isFinite(n));
  }

  // ----- drawing -----
  function element(name, attributes) {
    const node = document.createElementNS(SVG, name);
    for (const [key, value] of Object.entries(attributes || {})) node.setAttribute(key, String(value));
    return node;
  }

  /** A scene node as DOM: attributes set one by one, text only ever as textContent. */
  function nodeOf(sceneNode) {
    const node = element(sceneNode.tag, sceneNode.attributes);
    if (sceneNode.text !== undefined) node.textContent = String(sceneNode.text);
    for (const child of sceneNode.children || []) node.appendChild(nodeOf(child));
    return node;
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
    saveButton.disabled = !hasModel;
    lastScene = null;
    if (!hasModel) return;
    if (!renderer) throw new Error("the renderer did not load");

    const width = Math.round(svg.clientWidth || 480);
    const height = Math.round(svg.clientHeight || 420);
    svg.setAttribute("viewBox", `0 0 ${width} ${height}`);
    const scene = renderer.shapeScene(model, {
      width,
      height,
      rotation: isRotation(state.rotation) ? state.rotation : IDENTITY,
      mode: state.mode,
      theme: themeColours(),
      frame: heldFrame || undefined,
    });
    for (const node of scene.nodes) svg.appendChild(nodeOf(node));
    lastScene = scene;
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
      renderLewis();
      text("title", problem ? String(problem.text || "No model") : "No species");
      text("subtitle", problem ? String(problem.message) : "");
      text("mode-note", "");
      text("polarity", "");
      text("caution", "");
      return;
    }
    text("title", String(model.title));
    renderLewis();
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

  /** The Lewis diagram in the ink that reads on the editor's theme (dark themes get light ink). */
  function renderLewis() {
    const figure = document.getElementById("lewis");
    const lewis = state.model ? state.lewis : null;
    figure.hidden = !lewis;
    let image = figure.querySelector("img");
    if (!lewis) {
      if (image) image.remove();
      return;
    }
    if (!image) {
      image = document.createElement("img");
      figure.insertBefore(image, figure.firstChild);
    }
    const classes = document.body.classList;
    const darkTheme = classes.contains("vscode-dark") || classes.contains("vscode-high-contrast");
    image.src = darkTheme ? lewis.dark : lewis.light;
    image.alt = lewis.altText;
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
    if (!heldFrame && lastScene) heldFrame = lastScene.frame;
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
      state.rotation = startingRotation(state.model);
      heldFrame = null;
      render();
      save();
    }
  });
  for (const button of modeButtons) {
    button.addEventListener("click", () => {
      state.mode = button.dataset.mode === "electron" ? "electron" : "molecular";
      heldFrame = null;
      render();
      save();
      host.postMessage({ type: "mode", mode: state.mode });
    });
  }
  saveButton.addEventListener("click", () => {
    if (!lastScene || !state.model) return;
    const svgText = renderer.sceneSvg(lastScene, themeColours().background);
    host.postMessage({ type: "save-svg", svg: svgText, formula: String(state.model.formula) });
  });
  // The pane follows the editor layout: refit whenever the drawing area changes size.
  const refit = () => {
    heldFrame = null;
    render();
  };
  if (typeof ResizeObserver === "function") new ResizeObserver(refit).observe(svg);
  else window.addEventListener("resize", refit);

  window.addEventListener("message", (event) => {
    const message = event.data;
    if (!isObject(message)) return;
    if (message.type === "show") {
      const checked = checkedModel(message.model);
      state.model = checked.model;
      state.problem = checked.reason ? noModelProblem(checked.reason) : null;
      state.rotation = startingRotation(checked.model);
      state.lewis = checked.model ? checkedLewis(message.lewis) : null;
      heldFrame = null;
    } else if (message.type === "problem") {
      state.model = null;
      state.lewis = null;
      state.problem = checkedProblem(message);
    } else if (message.type === "clear") {
      state.model = null;
      state.lewis = null;
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
