// The bench's results as a console table and as results.md.

import type { BenchMeta } from "./bench-meta";
import type { Figure, Target } from "./figure";

function formatValue(value: number, unit: Figure["unit"]): string {
  if (!Number.isFinite(value)) return "miss";
  if (unit === "count") return String(Math.round(value));
  if (unit === "s") return `${value.toFixed(2)} s`;
  return Math.abs(value) >= 10 ? value.toFixed(1) : value.toFixed(2);
}

function formatTarget(target: Target | null, unit: Figure["unit"]): string {
  if (target === null) return "no target";
  return `target ${target.op} ${unit === "s" ? `${target.value} s` : target.value}`;
}

function verdictWord(figure: Figure): string {
  if (figure.meetsTarget === null) return "";
  return figure.meetsTarget ? "  met" : "  NOT MET";
}

/** One line per figure: `P2 sync/raw insert  min 0.41  median 0.44  max 0.47  (target ≥ 0.5)`. */
export function formatTable(figures: readonly Figure[]): string {
  const names = figures.map((f) => `${f.id} ${f.label}`);
  const width = Math.max(...names.map((n) => n.length));
  return figures
    .map((f, i) => {
      const name = (names[i] ?? "").padEnd(width);
      if (f.notMeasured !== null || f.spread === null)
        return `${name}  not measured: ${f.notMeasured}`;
      const s = f.spread;
      const cells = [s.min, s.median, s.max].map((v) => formatValue(v, f.unit).padStart(7));
      const note = f.note ? `  [${f.note}]` : "";
      return `${name}  min ${cells[0]}  median ${cells[1]}  max ${cells[2]}  (${formatTarget(f.target, f.unit)})${verdictWord(f)}${note}`;
    })
    .join("\n");
}

const cell = (v: number | string) =>
  typeof v === "number" ? (Number.isFinite(v) ? String(v) : "miss") : v;

/** The readable report: what ran where, the table, and every run's measurements. */
export function formatMarkdown(meta: BenchMeta, figures: readonly Figure[]): string {
  const lines: string[] = [
    `# Plumbline benchmark results${meta.tiny ? " (tiny run: sizes too small to judge by)" : ""}`,
    "",
    `Run ${meta.startedAt} to ${meta.finishedAt} on commit ${meta.commit}; ${meta.cores} cores (${meta.cpuModel}), Node ${meta.node}; load average ${meta.loadBefore} before, ${meta.loadAfter} after.`,
    `Worker: ${meta.worker}. Batches of ${meta.batchSize} records; every figure measured ${meta.sizes.repetitions} time(s) beside its floor. Regenerate with \`npm run bench\` (README, Benchmarks).`,
    "",
    "| figure | min | median | max | target | met |",
    "|---|---|---|---|---|---|",
    ...figures.map((f) =>
      f.spread === null
        ? `| ${f.id} ${f.label} | not measured: ${f.notMeasured} | | | ${formatTarget(f.target, f.unit)} | |`
        : `| ${f.id} ${f.label} | ${formatValue(f.spread.min, f.unit)} | ${formatValue(f.spread.median, f.unit)} | ${formatValue(f.spread.max, f.unit)} | ${formatTarget(f.target, f.unit)} | ${f.meetsTarget === null ? "" : f.meetsTarget ? "yes" : "no"} |`,
    ),
    "",
  ];
  for (const f of figures) {
    lines.push(`## ${f.id} ${f.label}`, "", f.definition, "");
    if (f.note) lines.push(`Median run: ${f.note}.`, "");
    const keys = [...new Set(f.runs.flatMap((r) => Object.keys(r.detail)))];
    if (f.runs.length > 0) {
      lines.push(
        `| run | value | ${keys.join(" | ")} |`,
        `|---|---|${keys.map(() => "---|").join("")}`,
      );
      f.runs.forEach((r, i) => {
        lines.push(
          `| ${i + 1} | ${formatValue(r.value, f.unit)} | ${keys.map((k) => cell(r.detail[k] ?? "")).join(" | ")} |`,
        );
      });
      lines.push("");
    }
  }
  return `${lines.join("\n")}\n`;
}
