/**
 * Serves the 3D view page to headless Chromium as the extension builds it: the page's HTML with a
 * fresh nonce, its script and style from client/media and the renderer from dist/webview.
 */
import { readFileSync } from "node:fs";
import { join } from "node:path";
import { randomBytes } from "node:crypto";
import { fileURLToPath } from "node:url";
import type { Page } from "playwright-core";
import { shapePageHtml } from "../../client/src/shapePageHtml";

/** The origin the page is served from; open `${SHAPE_PAGE_ORIGIN}/index.html`. */
export const SHAPE_PAGE_ORIGIN = "https://lonepair-webview.test";

const ROOT = fileURLToPath(new URL("../..", import.meta.url));
const MEDIA = join(ROOT, "client", "media");
const RENDERER = join(ROOT, "dist", "webview", "shapeScene.js");

/** Routes the page's requests on `page`; `extraBody` is added at the end of the page's body. */
export async function routeShapePage(page: Page, extraBody = ""): Promise<void> {
  const origin = SHAPE_PAGE_ORIGIN;
  const html = shapePageHtml({
    cspSource: origin,
    nonce: randomBytes(18).toString("base64"),
    scriptUri: `${origin}/media/shapeView.js`,
    rendererUri: `${origin}/webview/shapeScene.js`,
    styleUri: `${origin}/media/shapeView.css`,
  }).replace("</body>", `${extraBody}</body>`);
  await page.route(`${origin}/**`, async (route) => {
    const path = new URL(route.request().url()).pathname;
    if (path === "/index.html") return route.fulfill({ contentType: "text/html", body: html });
    if (path === "/webview/shapeScene.js") return route.fulfill({ contentType: "text/javascript", body: readFileSync(RENDERER) });
    const type = { "/media/shapeView.js": "text/javascript", "/media/shapeView.css": "text/css" }[path];
    if (!type) return route.fulfill({ status: 404, body: "" });
    return route.fulfill({ contentType: type, body: readFileSync(join(MEDIA, path.slice("/media/".length))) });
  });
}
