import { Passport } from "passport";
import { Strategy as GoogleStrategy, type Profile } from "passport-google-oauth20";
import type { Db } from "../db/client";
import { findActorById, findActorForSignIn } from "../staff/staff.repository";

/** Where the OAuth2 provider lives: Google in production, the local provider in the demo and tests. */
export interface OAuthSettings {
  clientID: string;
  clientSecret: string;
  authorizationURL: string;
  tokenURL: string;
  userProfileURL: string;
  callbackURL: string;
}

export type SignInRefusal = { kind: "not_invited"; email: string } | { kind: "sign_in_failed"; reason: string };

/** A passport instance of its own per app, so several apps can share one process in tests. */
export function createPassport(db: Db, oauth: OAuthSettings) {
  const passport = new Passport();
  passport.use(
    "google",
    new GoogleStrategy(
      {
        ...oauth,
        scope: ["openid", "profile", "email"],
        state: true,
        pkce: true,
      },
      (_accessToken: string, _refreshToken: string, profile: Profile, done: (err: unknown, user?: Express.User | false, info?: SignInRefusal) => void) => {
        // Only an address the provider has verified can match an invitation.
        const email = profile.emails?.find((e) => String((e as { verified?: unknown }).verified) === "true");
        if (!email) return done(null, false, { kind: "sign_in_failed", reason: "no verified e-mail address" });
        findActorForSignIn(db, { subject: profile.id, email: email.value })
          .then((actor) => done(null, actor ?? false, actor ? undefined : { kind: "not_invited", email: email.value }))
          .catch((error) => done(error));
      },
    ),
  );
  passport.serializeUser((user, done) => done(null, user.id));
  passport.deserializeUser((id: string, done) => {
    // A removed account has no actor: passport then treats the session as signed out.
    findActorById(db, id)
      .then((actor) => done(null, actor ?? false))
      .catch((error) => done(error));
  });
  return passport;
}
export type AppPassport = ReturnType<typeof createPassport>;
