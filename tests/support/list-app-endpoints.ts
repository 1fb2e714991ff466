import { readdirSync, readFileSync } from "node:fs";
import path from "node:path";

const APP = path.resolve(import.meta.dirname, "../../app");
const METHODS =
  /export\s+(?:const|async\s+function|function)\s+(GET|POST|PUT|PATCH|DELETE|HEAD|OPTIONS)\b/g;
const DESTRUCTURED = /export\s+const\s*\{([^}]*)\}\s*=/g;

function walk(dir: string): string[] {
  return readdirSync(dir, { withFileTypes: true }).flatMap((e) =>
    e.isDirectory() ? walk(path.join(dir, e.name)) : [path.join(dir, e.name)],
  );
}

/** Every route handler in app/, as "METHOD /path/[param]" (route groups left out of the path). */
export function listRouteHandlers(): string[] {
  const found: string[] = [];
  for (const file of walk(APP).filter((f) => /\/route\.tsx?$/.test(f))) {
    const source = readFileSync(file, "utf8");
    const segments = path
      .relative(APP, path.dirname(file))
      .split(path.sep)
      .filter((s) => s !== "" && !/^\(.*\)$/.test(s));
    const route = `/${segments.join("/")}`;
    const methods = new Set([...source.matchAll(METHODS)].map((m) => m[1] as string));
    for (const m of source.matchAll(DESTRUCTURED)) {
      for (const name of (m[1] ?? "").split(",").map((s) => s.trim())) {
        if (/^(GET|POST|PUT|PATCH|DELETE|HEAD|OPTIONS)$/.test(name)) methods.add(name);
      }
    }
    for (const method of methods) found.push(`${method} ${route}`);
  }
  return found.sort();
}

/** Every server action in app/ ("use server" files), as "app/…/actions.ts#exportName". */
export function listServerActionSources(): string[] {
  const found: string[] = [];
  for (const file of walk(APP).filter((f) => /\.tsx?$/.test(f))) {
    const source = readFileSync(file, "utf8");
    if (!/^\s*(?:\/\/[^\n]*\n\s*)*["']use server["']/.test(source)) continue;
    const rel = path.relative(path.dirname(APP), file).split(path.sep).join("/");
    for (const m of source.matchAll(/export\s+(?:const|async\s+function)\s+(\w+)/g)) {
      found.push(`${rel}#${m[1]}`);
    }
  }
  return found.sort();
}

/** Every print layout in app/ (a page under a `print` segment), as "/path/[param]" (route groups
 *  left out of the path). */
export function listPrintPages(): string[] {
  return walk(APP)
    .filter((f) => /\/page\.tsx?$/.test(f))
    .map((f) =>
      path
        .relative(APP, path.dirname(f))
        .split(path.sep)
        .filter((s) => s !== "" && !/^\(.*\)$/.test(s)),
    )
    .filter((segments) => segments.includes("print"))
    .map((segments) => `/${segments.join("/")}`)
    .sort();
}
