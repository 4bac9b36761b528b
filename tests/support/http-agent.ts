/**
 * A minimal browser stand-in for integration tests: fetch with a cookie jar and manual
 * redirects, so each step of the OAuth round trip can be seen and checked.
 */
export class HttpAgent {
  private cookies = new Map<string, string>();

  constructor(readonly baseUrl: string) {}

  /** Another tab of the same browser: same cookies from now on (copied, then independent). */
  newTab(): HttpAgent {
    const tab = new HttpAgent(this.baseUrl);
    tab.cookies = new Map(this.cookies);
    return tab;
  }

  /** The `name=value` pairs this agent would send (cookies here are host-wide, as in browsers). */
  cookieHeader(): string {
    return [...this.cookies].map(([k, v]) => `${k}=${v}`).join("; ");
  }

  private remember(res: Response) {
    for (const line of res.headers.getSetCookie()) {
      const [pair, ...attrs] = line.split(";");
      const eq = pair!.indexOf("=");
      const name = pair!.slice(0, eq).trim();
      const value = pair!.slice(eq + 1).trim();
      const expired = attrs.some((a) => /^\s*expires=Thu, 01 Jan 1970/i.test(a)) || value === "";
      if (expired) this.cookies.delete(name);
      else this.cookies.set(name, value);
    }
  }

  async request(path: string, init: RequestInit & { json?: unknown } = {}): Promise<Response> {
    const url = path.startsWith("http") ? path : `${this.baseUrl}${path}`;
    const headers = new Headers(init.headers);
    if (this.cookies.size) headers.set("cookie", this.cookieHeader());
    let body = init.body;
    if (init.json !== undefined) {
      headers.set("content-type", "application/json");
      body = JSON.stringify(init.json);
    }
    const send = () => fetch(url, { ...init, headers, body, redirect: "manual" });
    let res: Response;
    try {
      res = await send();
    } catch (error) {
      // A kept-alive connection to a server that has since restarted: browsers retry once.
      if ((error as { cause?: { code?: string } }).cause?.code !== "UND_ERR_SOCKET") throw error;
      res = await send();
    }
    this.remember(res);
    return res;
  }

  get = (path: string) => this.request(path);
  post = (path: string, json?: unknown) => this.request(path, { method: "POST", json });
  patch = (path: string, json?: unknown) => this.request(path, { method: "PATCH", json });
  put = (path: string, json?: unknown) => this.request(path, { method: "PUT", json });

  /** GET and parse JSON, asserting nothing: tests check status and body themselves. */
  async json<T = unknown>(path: string, init: RequestInit & { json?: unknown } = {}): Promise<{ status: number; body: T }> {
    const res = await this.request(path, init);
    const text = await res.text();
    return { status: res.status, body: (text ? JSON.parse(text) : undefined) as T };
  }
}

export interface SignInTrace {
  /** The provider's authorization URL the app sent the browser to. */
  authorizeUrl: URL;
  /** HTML of the provider's account picker. */
  pickerHtml: string;
  /** Where the app sent the browser after the callback. */
  finalLocation: string;
}

/**
 * The whole authorization-code round trip as a browser would make it:
 * app → provider's picker page → pick an account → callback with code → app session.
 */
export async function signIn(agent: HttpAgent, email: string, options: { returnTo?: string; name?: string; tamperState?: boolean } = {}): Promise<SignInTrace> {
  const start = await agent.get(`/auth/google${options.returnTo ? `?returnTo=${encodeURIComponent(options.returnTo)}` : ""}`);
  if (start.status !== 302) throw new Error(`expected a redirect to the provider, got ${start.status}`);
  const authorizeUrl = new URL(start.headers.get("location")!);
  const picker = await fetch(authorizeUrl);
  const pickerHtml = await picker.text();
  if (picker.status !== 200) throw new Error(`provider page answered ${picker.status}: ${pickerHtml}`);

  const form = new URLSearchParams(authorizeUrl.searchParams);
  form.set("email", email);
  if (options.name) form.set("name", options.name);
  if (options.tamperState) form.set("state", "not-the-state-we-were-given");
  const picked = await fetch(new URL("/authorize", authorizeUrl), { method: "POST", body: form, redirect: "manual" });
  if (picked.status !== 302) throw new Error(`provider answered ${picked.status}: ${await picked.text()}`);
  const callback = picked.headers.get("location")!;

  const done = await agent.get(callback);
  if (done.status !== 302) throw new Error(`callback answered ${done.status}: ${await done.text()}`);
  return { authorizeUrl, pickerHtml, finalLocation: done.headers.get("location")! };
}
