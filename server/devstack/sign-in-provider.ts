/**
 * A local OAuth 2.0 provider for the demo, development and tests. It speaks the same
 * authorization-code protocol (with PKCE) as Google's endpoints, so the app signs in through
 * the real passport-google-oauth20 strategy, only pointed here. Instead of a password it shows
 * a page to pick one of the demo accounts, or to type any name and address.
 *
 * Protocol work is done by @node-oauth/oauth2-server; tokens live in memory (they last minutes).
 */
import { createServer, type Server } from "node:http";
import type { AddressInfo } from "node:net";
import OAuth2Server, {
  OAuthError,
  Request as OAuthRequest,
  Response as OAuthResponse,
  type AuthorizationCode,
  type AuthorizationCodeModel,
  type Client,
  type Token,
  type User,
} from "@node-oauth/oauth2-server";
import express, { type Request, type Response } from "express";

export interface ProviderAccount {
  email: string;
  name: string;
  /** Shown under the name on the picker, e.g. "Head of science (demo)". */
  note?: string;
}

export interface SignInProviderOptions {
  clientId: string;
  clientSecret: string;
  /** Exact callback URLs the client may ask to return to. */
  redirectUris: string[];
  accounts: ProviderAccount[];
}

/** A stable subject id per address, as a real provider keeps one per account. */
const subjectFor = (email: string) => `local-${Buffer.from(email.toLowerCase()).toString("base64url")}`;

function splitName(name: string) {
  const parts = name.trim().split(/\s+/);
  return { given: parts[0] ?? name, family: parts.slice(1).join(" ") || undefined };
}

const escapeHtml = (s: string) =>
  s.replace(/[&<>"']/g, (c) => ({ "&": "&amp;", "<": "&lt;", ">": "&gt;", '"': "&quot;", "'": "&#39;" })[c]!);

const EMAIL = /^[^\s@]+@[^\s@]+\.[^\s@]+$/;

export function createSignInProvider(options: SignInProviderOptions) {
  const client: Client = {
    id: options.clientId,
    redirectUris: options.redirectUris,
    grants: ["authorization_code"],
    accessTokenLifetime: 600,
  };
  const codes = new Map<string, AuthorizationCode>();
  const tokens = new Map<string, Token>();

  const model: AuthorizationCodeModel = {
    async getClient(clientId, clientSecret) {
      if (clientId !== options.clientId) return false;
      if (clientSecret !== null && clientSecret !== undefined && clientSecret !== options.clientSecret) return false;
      return client;
    },
    async saveAuthorizationCode(code, c, user) {
      const saved = { ...code, client: c, user } as AuthorizationCode;
      codes.set(code.authorizationCode, saved);
      return saved;
    },
    async getAuthorizationCode(authorizationCode) {
      return codes.get(authorizationCode) ?? false;
    },
    async revokeAuthorizationCode(code) {
      return codes.delete(code.authorizationCode);
    },
    async saveToken(token, c, user) {
      const saved = { ...token, client: c, user } as Token;
      tokens.set(token.accessToken, saved);
      return saved;
    },
    async getAccessToken(accessToken) {
      return tokens.get(accessToken) ?? false;
    },
    async validateScope(_user, _client, scope) {
      return scope ?? ["openid", "profile", "email"];
    },
    async verifyScope() {
      return true;
    },
  };

  const oauth = new OAuth2Server({ model, allowBearerTokensInQueryString: true, allowEmptyState: false });

  const app = express();
  app.disable("x-powered-by");
  app.use(express.urlencoded({ extended: false }));

  const send = (res: Response, oauthRes: OAuthResponse) => {
    res.set(oauthRes.headers as Record<string, string>);
    res.status(oauthRes.status ?? 200);
    if (oauthRes.status === 302) return res.end();
    res.json(oauthRes.body);
  };
  const sendError = (res: Response, error: unknown) => {
    const e = error instanceof OAuthError ? error : new OAuthError(String(error));
    res.status(e.code ?? 500).json({ error: e.name, error_description: e.message });
  };

  const str = (v: unknown) => (typeof v === "string" ? v : "");
  /** The authorization request, validated before any page is shown. */
  const readRequest = (source: Record<string, unknown>) => {
    const redirectUri = str(source.redirect_uri);
    if (str(source.client_id) !== options.clientId || !options.redirectUris.includes(redirectUri)) return undefined;
    return {
      response_type: str(source.response_type),
      client_id: str(source.client_id),
      redirect_uri: redirectUri,
      scope: str(source.scope),
      state: str(source.state),
      code_challenge: str(source.code_challenge),
      code_challenge_method: str(source.code_challenge_method),
    };
  };

  app.get("/authorize", (req: Request, res: Response) => {
    const params = readRequest(req.query as Record<string, unknown>);
    if (!params) return res.status(400).type("html").send(page("Unknown application", "<p>This sign-in request did not come from a known application.</p>"));
    res.type("html").send(pickerPage(params, options.accounts));
  });

  app.post("/authorize", async (req: Request, res: Response) => {
    const params = readRequest(req.body as Record<string, unknown>);
    if (!params) return res.status(400).type("html").send(page("Unknown application", "<p>This sign-in request did not come from a known application.</p>"));
    if (req.body.cancel !== undefined) {
      const url = new URL(params.redirect_uri);
      url.searchParams.set("error", "access_denied");
      if (params.state) url.searchParams.set("state", params.state);
      return res.redirect(302, url.toString());
    }
    const email = str(req.body.email).trim().toLowerCase();
    const listed = options.accounts.find((a) => a.email.toLowerCase() === email);
    const name = listed?.name ?? str(req.body.name).trim();
    if (!EMAIL.test(email) || !name) {
      return res
        .status(400)
        .type("html")
        .send(pickerPage(params, options.accounts, "Give a name and a full e-mail address to continue."));
    }
    const user: User = { id: subjectFor(email), email, name };
    try {
      const oauthRes = new OAuthResponse(res);
      await oauth.authorize(new OAuthRequest(req), oauthRes, { authenticateHandler: { handle: () => user } });
      send(res, oauthRes);
    } catch (error) {
      sendError(res, error);
    }
  });

  app.post("/token", async (req: Request, res: Response) => {
    try {
      const oauthRes = new OAuthResponse(res);
      await oauth.token(new OAuthRequest(req), oauthRes);
      send(res, oauthRes);
    } catch (error) {
      sendError(res, error);
    }
  });

  // OpenID Connect userinfo claims; the path ends in /userinfo so passport reads them as such.
  app.get("/userinfo", async (req: Request, res: Response) => {
    try {
      const token = await oauth.authenticate(new OAuthRequest(req), new OAuthResponse(res));
      const user = token.user as User;
      const { given, family } = splitName(user.name);
      res.json({
        sub: user.id,
        name: user.name,
        given_name: given,
        ...(family ? { family_name: family } : {}),
        email: user.email,
        email_verified: true,
      });
    } catch (error) {
      sendError(res, error);
    }
  });

  let server: Server | undefined;
  return {
    app,
    async listen(port: number, host = "127.0.0.1"): Promise<AddressInfo> {
      server = createServer(app);
      await new Promise<void>((resolve, reject) => {
        server!.once("error", reject);
        server!.listen(port, host, () => resolve());
      });
      return server.address() as AddressInfo;
    },
    async close() {
      if (!server) return;
      server.closeAllConnections();
      await new Promise<void>((resolve) => server!.close(() => resolve()));
    },
  };
}
export type SignInProvider = ReturnType<typeof createSignInProvider>;

/** Endpoint URLs for the app's OAuth settings, given where the provider listens. */
export function signInProviderEndpoints(baseUrl: string) {
  const base = baseUrl.replace(/\/$/, "");
  return {
    authorizationURL: `${base}/authorize`,
    tokenURL: `${base}/token`,
    userProfileURL: `${base}/userinfo`,
  };
}

function hiddenFields(params: Record<string, string>) {
  return Object.entries(params)
    .map(([k, v]) => `<input type="hidden" name="${escapeHtml(k)}" value="${escapeHtml(v)}">`)
    .join("");
}

function pickerPage(params: Record<string, string>, accounts: ProviderAccount[], error?: string) {
  const hidden = hiddenFields(params);
  const rows = accounts
    .map(
      (a) => `<li><form method="post" action="/authorize">${hidden}
        <input type="hidden" name="email" value="${escapeHtml(a.email)}">
        <button type="submit"><strong>${escapeHtml(a.name)}</strong><span>${escapeHtml(a.email)}</span>${
          a.note ? `<em>${escapeHtml(a.note)}</em>` : ""
        }</button></form></li>`,
    )
    .join("");
  return page(
    "Local sign-in",
    `<p class="lead">This stands in for the school's identity provider on this computer. Pick who to sign in as.</p>
    ${error ? `<p class="error" role="alert">${escapeHtml(error)}</p>` : ""}
    <ul class="accounts">${rows}</ul>
    <details${error ? " open" : ""}><summary>Someone else</summary>
      <form method="post" action="/authorize" class="other">${hidden}
        <label>Name <input name="name" autocomplete="off" required></label>
        <label>E-mail address <input name="email" type="email" autocomplete="off" required></label>
        <button type="submit">Continue</button>
      </form>
    </details>
    <form method="post" action="/authorize">${hidden}<button type="submit" name="cancel" value="1" class="cancel">Cancel sign-in</button></form>`,
  );
}

function page(title: string, body: string) {
  return `<!doctype html><html lang="en"><head><meta charset="utf-8">
<meta name="viewport" content="width=device-width, initial-scale=1">
<link rel="icon" href="data:,">
<title>${escapeHtml(title)}</title>
<style>
  body { font: 18px/1.5 system-ui, sans-serif; margin: 0; background: #eef1f4; color: #16202c; }
  main { max-width: 34rem; margin: 3rem auto; padding: 2rem; background: #fff; border: 2px solid #16202c; }
  h1 { margin-top: 0; font-size: 1.6rem; }
  .lead { color: #3a4656; }
  ul.accounts { list-style: none; padding: 0; display: grid; gap: .5rem; }
  ul.accounts button { width: 100%; text-align: left; display: grid; gap: .1rem; padding: .75rem 1rem; min-height: 44px;
    background: #fff; border: 2px solid #8c98a8; border-radius: 6px; font: inherit; cursor: pointer; }
  ul.accounts button:hover, ul.accounts button:focus-visible { border-color: #16202c; outline: 3px solid #f2b705; }
  ul.accounts span { color: #3a4656; font-size: .9em; }
  ul.accounts em { font-size: .85em; color: #5b2a86; font-style: normal; }
  .other { display: grid; gap: .75rem; margin-top: .75rem; }
  .other input { display: block; width: 100%; font: inherit; padding: .5rem; box-sizing: border-box; }
  .other button, .cancel { font: inherit; min-height: 44px; padding: .5rem 1rem; cursor: pointer; }
  .cancel { margin-top: 1.5rem; background: none; border: none; text-decoration: underline; color: #3a4656; }
  .error { border-left: 6px solid #b3261e; padding: .5rem 1rem; background: #fdecea; }
</style></head><body><main><h1>${escapeHtml(title)}</h1>${body}</main></body></html>`;
}
