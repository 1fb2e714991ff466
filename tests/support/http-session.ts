/** A tiny cookie-keeping HTTP client for talking to the test app like a browser would. */
export class HttpSession {
  private cookies = new Map<string, string>();

  constructor(readonly baseUrl: string) {}

  async fetch(pathname: string, init: RequestInit = {}): Promise<Response> {
    const headers = new Headers(init.headers);
    if (this.cookies.size > 0) {
      headers.set("cookie", this.cookieHeader());
    }
    const response = await fetch(new URL(pathname, this.baseUrl), {
      ...init,
      headers,
      redirect: "manual",
    });
    for (const line of response.headers.getSetCookie()) {
      const [pair] = line.split(";");
      const eq = pair?.indexOf("=") ?? -1;
      if (!pair || eq < 0) continue;
      const name = pair.slice(0, eq).trim();
      const value = pair.slice(eq + 1);
      if (value === "" || /max-age=0|expires=thu, 01 jan 1970/i.test(line))
        this.cookies.delete(name);
      else this.cookies.set(name, value);
    }
    return response;
  }

  hasCookie(name: string): boolean {
    return this.cookies.has(name);
  }

  /** The Cookie header this session sends (for a client other than fetch, e.g. the bench's). */
  cookieHeader(): string {
    return [...this.cookies].map(([k, v]) => `${k}=${v}`).join("; ");
  }

  /** Sign in through Auth.js's own credentials endpoint (CSRF token first), as the form does. */
  async signInWithPassword(email: string, password: string): Promise<Response> {
    const csrf = (await (await this.fetch("/api/auth/csrf")).json()) as { csrfToken: string };
    return this.fetch("/api/auth/callback/credentials", {
      method: "POST",
      headers: { "content-type": "application/x-www-form-urlencoded" },
      body: new URLSearchParams({
        csrfToken: csrf.csrfToken,
        email,
        password,
        callbackUrl: "/home",
      }),
    });
  }
}
