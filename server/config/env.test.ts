import { describe, expect, it } from "vitest";
import { parseEnv } from "./env";

describe("environment", () => {
  it("defaults to the demo on loopback", () => {
    const env = parseEnv({});
    expect(env).toMatchObject({ LINKLEAP_MODE: "demo", HOST: "127.0.0.1", PORT: 4300, PG_PORT: 4310 });
  });

  it("names a bad value and why", () => {
    expect(() => parseEnv({ PORT: "eighty" })).toThrow(/PORT/);
    expect(() => parseEnv({ SESSION_SECRET: "short" })).toThrow(/SESSION_SECRET: must be at least 32 characters/);
  });

  it("refuses production without the real services, listing what is missing", () => {
    expect(() => parseEnv({ LINKLEAP_MODE: "production", DATABASE_URL: "postgres://db/linkleap" })).toThrow(
      "LINKLEAP_MODE=production needs: PUBLIC_URL, SESSION_SECRET, GOOGLE_CLIENT_ID, GOOGLE_CLIENT_SECRET, SMTP_HOST",
    );
  });
});
