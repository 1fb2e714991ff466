import type { BrowserContext, Page } from "@playwright/test";

/**
 * Collect every page's content-security-policy violations from its first script on
 * (`securitypolicyviolation`, W3C CSP Level 3 §5.3); read them with the returned function. A
 * navigation starts a fresh list.
 */
export async function watchCspViolations(
  context: BrowserContext,
): Promise<(page: Page) => Promise<string[]>> {
  await context.addInitScript(() => {
    const seen: string[] = [];
    (window as unknown as { __cspViolations: string[] }).__cspViolations = seen;
    document.addEventListener("securitypolicyviolation", (e) => {
      seen.push(`${e.violatedDirective} ${e.blockedURI} ${e.sourceFile}:${e.lineNumber}`);
    });
  });
  return (page) =>
    page.evaluate(() => (window as unknown as { __cspViolations: string[] }).__cspViolations);
}
