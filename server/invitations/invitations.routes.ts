import { Router } from "express";
import { inviteStaffInputSchema } from "../contracts/invitations";
import { redirectWithNotice } from "../auth/auth.routes";
import { actorOf, requireRole } from "../auth/guards";
import { parseId, parseInput } from "../http/validate";
import { listOpenInvitations } from "./invitations.repository";
import {
  cancelInvitation,
  invitationForToken,
  inviteStaff,
  listDepartments,
  resendInvitation,
  type InvitationDeps,
} from "./invitations.service";

/** School admins invite staff; the invited person follows the e-mailed link into sign-in. */
export function invitationsRoutes(deps: InvitationDeps) {
  const { db } = deps;
  const router = Router();
  const publicHost = new URL(deps.publicUrl).host;

  /**
   * The link in the e-mail. It only starts sign-in: the invitation is accepted once the
   * provider vouches for the invited address (see acceptInvitationOnSignIn).
   */
  router.get("/auth/invitation/:token", async (req, res, next) => {
    // Sign-in must start on the public host, or its state cookie would not come back.
    if (req.headers.host !== publicHost) return res.redirect(`${deps.publicUrl}${req.originalUrl}`);
    const { row, closed } = await invitationForToken(db, req.params.token);
    if (!row || closed) return redirectWithNotice(req, res, next, { kind: "invitation_closed", reason: closed ?? "unknown" }, "/sign-in");
    delete req.session.signInNotice;
    req.session.invitationId = row.id;
    req.session.save((error) => (error ? next(error) : res.redirect("/auth/google")));
  });

  router.use("/api/invitations", requireRole("admin"));

  router.get("/api/invitations", async (req, res) => {
    res.json(await listOpenInvitations(db, actorOf(req).schoolId, new Date()));
  });

  router.post("/api/invitations", async (req, res) => {
    const input = parseInput(inviteStaffInputSchema, req.body);
    res.status(201).json(await inviteStaff(deps, actorOf(req), input));
  });

  router.post("/api/invitations/:invitationId/resend", async (req, res) => {
    const id = parseId(req.params.invitationId, "That invitation");
    res.json(await resendInvitation(deps, actorOf(req), id));
  });

  router.delete("/api/invitations/:invitationId", async (req, res) => {
    await cancelInvitation(db, actorOf(req), parseId(req.params.invitationId, "That invitation"));
    res.status(204).end();
  });

  router.get("/api/school/departments", requireRole("admin"), async (req, res) => {
    res.json(await listDepartments(db, actorOf(req).schoolId));
  });

  return router;
}
