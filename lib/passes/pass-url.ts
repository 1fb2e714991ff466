import { maxCompactJwsLength } from "./parse-compact-jws";

/** Three base64url parts joined by dots: the shape of a compact JWS, nothing more. */
const compactJwsShape = /^[A-Za-z0-9_-]+\.[A-Za-z0-9_-]+\.[A-Za-z0-9_-]+$/;

/** The path a pass URL ends in: `/p/<token>`, optionally with a trailing slash. */
const passPath = /\/p\/([^/]+)\/?$/;

/**
 * The URL a pass QR encodes: `${appUrl}/p/${token}`. A plain phone camera opens it as a web
 * page; the tech line's scanner takes the token out of it and verifies it offline.
 * @param appUrl the app's public origin, with or without a trailing slash
 */
export function passUrl(appUrl: string, token: string): string {
  return `${appUrl.replace(/\/+$/, "")}/p/${token}`;
}

/**
 * The pass token in whatever a scanner or a person typed: a pass URL (from any host — whether
 * the pass is good is the verifier's decision, not the host's), or a bare token, with
 * surrounding whitespace. Null when the text holds nothing shaped like a token.
 */
export function extractPassToken(scannedText: string): string | null {
  const text = scannedText.trim();
  if (text.length === 0 || text.length > maxCompactJwsLength + 2048) return null;
  if (compactJwsShape.test(text)) return text.length <= maxCompactJwsLength ? text : null;
  let url: URL;
  try {
    url = new URL(text);
  } catch {
    return null;
  }
  if (url.protocol !== "https:" && url.protocol !== "http:") return null;
  const segment = passPath.exec(url.pathname)?.[1];
  if (!segment || segment.length > maxCompactJwsLength) return null;
  return compactJwsShape.test(segment) ? segment : null;
}
