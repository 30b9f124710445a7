import "server-only";
import { createRequire } from "node:module";
import path from "node:path";
import type { ReactElement } from "react";

type StaticRenderer = { renderToStaticMarkup: (element: ReactElement) => string };
let renderer: StaticRenderer | null = null;

// Next.js bundles route handlers for React Server Components, where `react-dom/server` is refused at build
// time and replaced by a module that throws. A printed document is plain static HTML for Chromium, so the
// Node build of react-dom/server is loaded at run time, outside the bundle. Our document components are
// plain functions without hooks or client components, so elements from the bundled React render the same.
function staticRenderer(): StaticRenderer {
  if (!renderer) {
    const requireFromApp = createRequire(path.join(/* turbopackIgnore: true */ process.cwd(), "package.json"));
    renderer = requireFromApp(["react-dom", "server"].join("/")) as StaticRenderer;
  }
  return renderer;
}

/** A whole HTML document (with doctype) from a React element whose root is <html>; for renderPdf. */
export function renderDocumentHtml(element: ReactElement): string {
  return `<!doctype html>${staticRenderer().renderToStaticMarkup(element)}`;
}
