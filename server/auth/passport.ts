import type { Request } from "express";
import { Passport } from "passport";
import { Strategy as GoogleStrategy, type Profile } from "passport-google-oauth20";
import type { Db } from "../db/client";
import { acceptInvitationOnSignIn, type InvitationRefusal } from "../invitations/invitations.service";
import { findActorById, findActorForSignIn, type Actor } from "../staff/staff.repository";

/** Where the OAuth2 provider lives: Google in production, the local provider in the demo and tests. */
export interface OAuthSettings {
  clientID: string;
  clientSecret: string;
  authorizationURL: string;
  tokenURL: string;
  userProfileURL: string;
  callbackURL: string;
}

export type SignInRefusal = InvitationRefusal | { kind: "sign_in_failed"; reason: string };

/**
 * Staff sign in as themselves; anyone else gets in only through an open invitation for the
 * verified address (the one whose link they followed, if any).
 */
async function signInStaff(
  db: Db,
  identity: { subject: string; email: string },
  invitationId: string | undefined,
): Promise<{ actor: Actor } | { refusal: SignInRefusal }> {
  const actor = await findActorForSignIn(db, identity);
  if (actor) return { actor };
  return acceptInvitationOnSignIn(db, identity, invitationId);
}

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
        passReqToCallback: true,
      },
      (
        req: Request,
        _accessToken: string,
        _refreshToken: string,
        profile: Profile,
        done: (err: unknown, user?: Express.User | false, info?: SignInRefusal) => void,
      ) => {
        // Only an address the provider has verified can match staff or an invitation.
        const email = profile.emails?.find((e) => String((e as { verified?: unknown }).verified) === "true");
        if (!email) return done(null, false, { kind: "sign_in_failed", reason: "no verified e-mail address" });
        signInStaff(db, { subject: profile.id, email: email.value }, req.session?.invitationId)
          .then((result) => ("actor" in result ? done(null, result.actor) : done(null, false, result.refusal)))
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
