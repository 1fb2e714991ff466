import type { ReactElement } from "react";
import { renderToStaticMarkup } from "react-dom/server";

/** Static markup of a component, as the server would send it. */
export function render(element: ReactElement): string {
  return renderToStaticMarkup(element);
}

/** Every value of one attribute in the markup, in document order. */
export function attributeValues(markup: string, name: string): string[] {
  const pattern = new RegExp(`\\s${name}="([^"]*)"`, "g");
  return [...markup.matchAll(pattern)].map((m) => m[1] ?? "");
}

/**
 * The markup of the element carrying `data-testid="<testId>"`, through its matching closing
 * tag (same tag name, nesting counted), so a test can look inside one part of a drawing.
 */
export function partByTestId(markup: string, testId: string): string {
  const start = markup.indexOf(`data-testid="${testId}"`);
  if (start < 0) throw new Error(`no element with data-testid="${testId}"`);
  const open = markup.lastIndexOf("<", start);
  const tag = /^<([a-zA-Z]+)/.exec(markup.slice(open))?.[1] ?? "";
  const pattern = new RegExp(`<(/?)${tag}[\\s>]`, "g");
  pattern.lastIndex = open;
  let depth = 0;
  for (let m = pattern.exec(markup); m !== null; m = pattern.exec(markup)) {
    depth += m[1] === "/" ? -1 : 1;
    if (depth === 0) return markup.slice(open, m.index + tag.length + 3);
  }
  throw new Error(`unclosed <${tag}> for data-testid="${testId}"`);
}

/** Visible text of some markup: tags dropped, entities for quotes and ampersands decoded. */
export function textOf(markup: string): string {
  return markup
    .replace(/<title>[\s\S]*?<\/title>/g, " ")
    .replace(/<[^>]+>/g, " ")
    .replace(/&#x27;/g, "'")
    .replace(/&quot;/g, '"')
    .replace(/&amp;/g, "&")
    .replace(/\s+/g, " ")
    .trim();
}
