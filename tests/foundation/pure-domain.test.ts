import { readdirSync, readFileSync } from "node:fs";
import { dirname, join, relative, resolve } from "node:path";
import { describe, expect, it } from "vitest";

// The pure domain folders run on the phone and the server alike (ARCHITECTURE.md): no React, no
// Next, no database, no clock. This reads every file's imports and its use of the clock.
const root = resolve(__dirname, "../..");
const allowed: Record<string, string[]> = {
  "lib/scrutineer": ["lib/scrutineer"],
  "lib/paddock": ["lib/paddock", "lib/scrutineer"],
};
const packages = new Set(["zod"]);

function filesUnder(dir: string): string[] {
  return readdirSync(join(root, dir), { withFileTypes: true }).flatMap((e) => {
    const path = join(dir, e.name);
    if (e.isDirectory()) return filesUnder(path);
    return /\.tsx?$/.test(e.name) ? [path] : [];
  });
}

function importsOf(source: string): string[] {
  const statements = /^\s*(?:import|export)\b[^;]*?from\s*["']([^"']+)["']/gm;
  const bare = /^\s*import\s*["']([^"']+)["']/gm;
  const dynamic = /\bimport\(\s*["']([^"']+)["']\s*\)/g;
  return [statements, bare, dynamic].flatMap((re) =>
    [...source.matchAll(re)].map((m) => m[1] ?? ""),
  );
}

describe.each(Object.keys(allowed))("%s stays pure", (folder) => {
  const files = (() => {
    try {
      return filesUnder(folder);
    } catch {
      return [];
    }
  })();
  it.each(files)("%s imports only pure code and reads no clock", (file) => {
    const source = readFileSync(join(root, file), "utf8");
    for (const spec of importsOf(source)) {
      if (spec.startsWith(".")) {
        const target = relative(root, resolve(dirname(join(root, file)), spec));
        expect(
          allowed[folder]?.some((ok) => target.startsWith(`${ok}/`)),
          `${file} imports ${target}`,
        ).toBe(true);
      } else {
        expect(packages.has(spec), `${file} imports the package ${spec}`).toBe(true);
      }
    }
    // Time is a parameter: no Date.now(), no argument-less new Date().
    expect(source).not.toMatch(/Date\.now\(|new Date\(\)/);
  });
});
