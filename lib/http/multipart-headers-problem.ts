/**
 * Why a multipart body's part headers cannot be read, or null. HTTP header text may not hold
 * control characters (RFC 9110 §5.5), and Next's own form parser answers a server action whose
 * part header has one with a 500 before any of Plumbline's code runs, so proxy.ts refuses such a
 * body first, as the client's mistake (400).
 */
export function multipartHeadersProblem(body: string, contentType: string): string | null {
  const boundary = /boundary=(?:"([^"]+)"|([^;\s]+))/i.exec(contentType);
  const mark = boundary?.[1] ?? boundary?.[2];
  if (!mark) return "The form has no boundary.";
  // Source: RFC 2046 §5.1.1 — the body ends with the close delimiter, "--" boundary "--".
  if (!body.includes(`--${mark}--`)) return "The form was cut short; send it again.";
  for (const part of body.split(`--${mark}`).slice(1)) {
    if (part.startsWith("--")) break;
    const end = part.indexOf("\r\n\r\n");
    const head = end < 0 ? part : part.slice(0, end);
    if (hasControlCharacter(head)) {
      return "A field of the form has a name that cannot be sent.";
    }
  }
  return null;
}

/** A control character other than tab (allowed in header text) and CR/LF (between the lines). */
function hasControlCharacter(text: string): boolean {
  for (let i = 0; i < text.length; i += 1) {
    const code = text.charCodeAt(i);
    if ((code < 0x20 && code !== 0x09 && code !== 0x0a && code !== 0x0d) || code === 0x7f) {
      return true;
    }
  }
  return false;
}
