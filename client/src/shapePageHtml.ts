/**
 * The HTML of the 3D shape page. Pure (no editor API), so the extension and the browser test
 * build exactly the same page under exactly the same Content-Security-Policy.
 */

/** What the page needs from its host. */
export interface ShapePageResources {
  /** The webview's `cspSource`: the only origin styles and images may come from. */
  readonly cspSource: string;
  /** A fresh random nonce; the one script tag carries it. */
  readonly nonce: string;
  readonly scriptUri: string;
  /** The renderer bundle the page script draws with; loaded first. */
  readonly rendererUri: string;
  readonly styleUri: string;
}

/** The policy: nothing by default, styles and images from the extension, scripts by nonce only. */
export function shapePageContentSecurityPolicy(resources: Pick<ShapePageResources, "cspSource" | "nonce">): string {
  return [
    "default-src 'none'",
    `img-src ${resources.cspSource} data:`,
    `style-src ${resources.cspSource}`,
    `script-src 'nonce-${resources.nonce}'`,
  ].join("; ");
}

/** The page: a drawing area, a legend and a view toggle; the script fills them in. */
export function shapePageHtml(resources: ShapePageResources): string {
  const attribute = escapeAttribute;
  return `<!DOCTYPE html>
<html lang="en">
<head>
<meta charset="UTF-8">
<meta http-equiv="Content-Security-Policy" content="${attribute(shapePageContentSecurityPolicy(resources))}">
<meta name="viewport" content="width=device-width, initial-scale=1.0">
<link rel="stylesheet" href="${attribute(resources.styleUri)}">
<title>lonepair: 3D shape</title>
</head>
<body>
<main class="layout">
  <section class="stage" aria-label="3D model">
    <svg id="model" role="img" aria-label="Ball-and-stick model; drag or use the arrow keys to rotate" tabindex="0"></svg>
    <p id="empty" class="empty">Put the cursor on a species in a lab note or data table to see its shape.</p>
  </section>
  <aside class="legend" aria-label="Legend">
    <h1 id="title"></h1>
    <p id="subtitle" class="subtitle"></p>
    <figure id="lewis" class="lewis" hidden><figcaption>Lewis structure</figcaption></figure>
    <div class="toggle" role="group" aria-label="What to show">
      <button type="button" id="show-molecular" data-mode="molecular">Molecular geometry</button>
      <button type="button" id="show-electron" data-mode="electron">Electron geometry</button>
    </div>
    <p class="mode-note" id="mode-note"></p>
    <div id="centres"></div>
    <p id="polarity" class="polarity"></p>
    <ul id="warnings" class="warnings"></ul>
    <p id="caution" class="caution"></p>
    <p class="actions"><button type="button" id="save-svg">Save view as SVG…</button></p>
    <p class="hint">Drag to rotate. Arrow keys rotate too; R resets the view.</p>
  </aside>
</main>
<script nonce="${attribute(resources.nonce)}" src="${attribute(resources.rendererUri)}"></script>
<script nonce="${attribute(resources.nonce)}" src="${attribute(resources.scriptUri)}"></script>
</body>
</html>`;
}

function escapeAttribute(text: string): string {
  return text.replace(/&/g, "&amp;").replace(/"/g, "&quot;").replace(/</g, "&lt;").replace(/>/g, "&gt;");
}
