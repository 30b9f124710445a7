import { existsSync, readdirSync, readFileSync, statSync } from "node:fs";
import path from "node:path";

/*
 * The app's surface, found from the file tree and the build rather than listed by hand, so that pages,
 * route handlers and server actions added later are probed too:
 * - pages: every app/.../page.tsx (route groups dropped), with the permission its requirePageUser asks;
 * - route handlers: every app/.../route.ts with the HTTP methods it exports;
 * - server actions: every action in the build's server-reference manifest (what the server will run),
 *   with the file and export it comes from and the permission its requireUser asks.
 */
const ROOT = path.resolve(import.meta.dirname, "../../..");
const APP = path.join(ROOT, "app");

export type PageRoute = { file: string; pattern: string; params: string[]; declared: string | null };
export type RouteHandler = { file: string; pattern: string; params: string[]; methods: string[]; declared: string | null };
export type ServerAction = { id: string; file: string; name: string; pages: string[]; permission: string | null };

function walk(dir: string): string[] {
  return readdirSync(dir).flatMap((name) => {
    const full = path.join(dir, name);
    return statSync(full).isDirectory() ? walk(full) : [full];
  });
}

/** "/runs/[labNumber]" from "app/(staff)/runs/[labNumber]/page.tsx". */
function patternOf(file: string): { pattern: string; params: string[] } {
  const segments = path.relative(APP, path.dirname(file)).split(path.sep).filter((s) => s && !/^\(.*\)$/.test(s));
  const params = segments.filter((s) => s.startsWith("[")).map((s) => s.replace(/^\[+\.*|\]+$/g, ""));
  return { pattern: `/${segments.join("/")}`, params };
}

const firstCall = (source: string, fn: string) => new RegExp(`${fn}\\("([a-z.]+)"\\)`).exec(source)?.[1] ?? null;

export function discoverPages(): PageRoute[] {
  return walk(APP)
    .filter((f) => /[\\/]page\.tsx?$/.test(f))
    .map((file) => ({ file: path.relative(ROOT, file), ...patternOf(file), declared: firstCall(readFileSync(file, "utf8"), "requirePageUser") }))
    .sort((a, b) => a.pattern.localeCompare(b.pattern));
}

export function discoverRouteHandlers(): RouteHandler[] {
  return walk(APP)
    .filter((f) => /[\\/]route\.tsx?$/.test(f))
    .map((file) => {
      const source = readFileSync(file, "utf8");
      const methods = ["GET", "POST", "PUT", "PATCH", "DELETE"].filter((m) => new RegExp(`function ${m}\\(|\\bas ${m}\\b|const ${m}\\b`).test(source));
      return { file: path.relative(ROOT, file), ...patternOf(file), methods, declared: firstCall(source, "requireUser") };
    })
    .sort((a, b) => a.pattern.localeCompare(b.pattern));
}

type Manifest = { node: Record<string, { workers: Record<string, unknown>; filename?: string; exportedName?: string }> };

/** The body of `export async function name(` up to the next export, for finding what it asks for. */
function exportBody(source: string, name: string): string {
  const start = source.indexOf(`export async function ${name}(`);
  if (start === -1) return "";
  const next = source.indexOf("\nexport ", start + 1);
  return source.slice(start, next === -1 ? undefined : next);
}

export function discoverServerActions(): ServerAction[] {
  const manifestFile = path.join(ROOT, ".next", "server", "server-reference-manifest.json");
  if (!existsSync(manifestFile)) throw new Error("no production build: the probe reads the server actions from .next/server/server-reference-manifest.json");
  const manifest = JSON.parse(readFileSync(manifestFile, "utf8")) as Manifest;
  return Object.entries(manifest.node)
    .map(([id, entry]) => {
      const file = entry.filename ?? "";
      const name = entry.exportedName ?? "";
      const source = file && existsSync(path.join(ROOT, file)) ? readFileSync(path.join(ROOT, file), "utf8") : "";
      const pages = Object.keys(entry.workers).map((w) => patternOf(path.join(ROOT, `${w}.tsx`)).pattern);
      return { id, file, name, pages, permission: firstCall(exportBody(source, name), "requireUser") };
    })
    .sort((a, b) => `${a.file}:${a.name}`.localeCompare(`${b.file}:${b.name}`));
}

/** Every function exported from a "use server" file, to check each one is in the build (or not exposed at all). */
export function discoverDeclaredActions(): Array<{ file: string; name: string }> {
  return walk(APP)
    .filter((f) => /\.tsx?$/.test(f))
    .flatMap((file) => {
      const source = readFileSync(file, "utf8");
      if (!/^\s*["']use server["']/.test(source)) return [];
      return [...source.matchAll(/export async function (\w+)\(/g)].map((m) => ({ file: path.relative(ROOT, file), name: m[1]! }));
    });
}
