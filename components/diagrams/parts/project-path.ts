import type { DiagramView } from "./diagram-view";
import { projectPoint } from "./project-point";

const TOKEN = /[A-Za-z]|-?(?:\d+\.?\d*|\.\d+)(?:e[-+]?\d+)?/g;

/**
 * Projects SVG path data written in the car's space. Only absolute M, L, Q, C and Z are allowed:
 * their numbers come in (x, y) pairs, so each pair can be projected on its own.
 */
export function projectPath(d: string, view: DiagramView): string {
  const tokens = d.match(TOKEN) ?? [];
  const out: string[] = [];
  let pending: number | null = null;
  for (const token of tokens) {
    if (/^[A-Za-z]$/.test(token)) {
      if (!"MLQCZ".includes(token))
        throw new Error(`projectPath: use M, L, Q, C or Z, not ${token}`);
      if (pending !== null) throw new Error("projectPath: a coordinate is missing its pair");
      out.push(token);
      continue;
    }
    const n = Number(token);
    if (pending === null) {
      pending = n;
    } else {
      const [x, y] = projectPoint(view, pending, n);
      out.push(`${x} ${y}`);
      pending = null;
    }
  }
  if (pending !== null) throw new Error("projectPath: a coordinate is missing its pair");
  return out.join(" ");
}
