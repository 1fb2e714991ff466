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
  for (const part of body.split(`--${mark}`).slice(1)) {
    if (part.startsWith("--")) break;
    const end = part.indexOf("\r\n\r\n");
    const head = end < 0 ? part : part.slice(0, end);
    // Tab is allowed in header text; CR and LF separate the header lines.
    if (/[\u0000-\u0008\u000b\u000c\u000e-\u001f\u007f]/.test(head)) {
      return "A field of the form has a name that cannot be sent.";
    }
  }
  return null;
}
