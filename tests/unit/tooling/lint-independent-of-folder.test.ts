import { readdirSync, readFileSync } from "node:fs";
import path from "node:path";
import { ESLint } from "eslint";
import { describe, expect, it } from "vitest";

const root = path.resolve(import.meta.dirname, "../../..");

/** Source files that hold <head> or an inline ESLint directive: the ones a path-dependent rule could trip. */
function sensitiveFiles(): string[] {
  const found: string[] = [];
  const walk = (dir: string) => {
    for (const entry of readdirSync(path.join(root, dir), { withFileTypes: true })) {
      const rel = path.join(dir, entry.name);
      if (entry.isDirectory()) {
        if (entry.name !== "generated" && entry.name !== "node_modules") walk(rel);
      } else if (/\.(ts|tsx)$/.test(entry.name) && /eslint-disable|<head>/.test(readFileSync(path.join(root, rel), "utf8"))) found.push(rel);
    }
  };
  for (const dir of ["app", "components", "lib"]) walk(dir);
  return found;
}

/**
 * Lints files as if the clone lived in `folder`. The Next.js rule against <head> decides by the absolute
 * path (silent anywhere under a folder named "app"), so a clone under such a folder once failed `npm test`
 * on an unused disable directive in the printed-document frame.
 */
async function lintAsIfClonedInto(folder: string, files: string[]) {
  const cwd = path.join("/tmp", "seepline-lint-check", folder);
  const eslint = new ESLint({
    cwd,
    overrideConfigFile: path.join(root, "eslint.config.mjs"),
    // The pages-directory rule only looks for a folder that this App Router project does not have.
    overrideConfig: { linterOptions: { reportUnusedDisableDirectives: "error" }, rules: { "@next/next/no-html-link-for-pages": "off" } },
  });
  const messages: string[] = [];
  for (const file of files) {
    const [result] = await eslint.lintText(readFileSync(path.join(root, file), "utf8"), { filePath: path.join(cwd, file) });
    messages.push(...result!.messages.map((m) => `${file} ${m.ruleId ?? "directive"}: ${m.message}`));
  }
  return messages;
}

describe("lint does not depend on the folder the clone lives in", () => {
  const files = sensitiveFiles();
  it("finds the printed-document frame among the files to check", () => {
    expect(files).toContain(path.join("components", "documents", "document-frame.tsx"));
  });
  it.each(["app", "seepline", "work/app/src"])("reports nothing for them in a clone under %s", async (folder) => {
    expect(await lintAsIfClonedInto(folder, files)).toEqual([]);
  }, 60_000);
});
