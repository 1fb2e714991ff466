/** The public paddock board (`/board/<event>`): a screen across the paddock, nobody signs in
 *  there, and it uses the whole width. */
export function isBoardPath(pathname: string | null): boolean {
  return pathname !== null && /^\/board\/[^/]+\/?$/.test(pathname);
}
