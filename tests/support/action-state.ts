/**
 * The state a server action answered, read from its RSC payload (a line `1:{…}` holding the
 * returned object). Throws with the payload's start when there is none.
 */
export function actionState<T = { status: string; message?: string }>(text: string): T {
  for (const line of text.split("\n")) {
    const match = /^[0-9a-f]+:(\{.*\})$/.exec(line);
    if (!match?.[1]) continue;
    try {
      const value = JSON.parse(match[1]) as Record<string, unknown>;
      if (typeof value.status === "string") return value as T;
    } catch {
      // not this line
    }
  }
  throw new Error(`no action state in: ${text.slice(0, 300)}`);
}
