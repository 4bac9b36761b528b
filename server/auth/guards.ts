import type { NextFunction, Request, RequestHandler, Response } from "express";
import type { StaffRole } from "../contracts/staff-roles";
import { forbidden, unauthenticated } from "../http/app-error";
import type { Actor } from "../staff/staff.repository";

/** 401 unless someone is signed in. */
export const requireStaff: RequestHandler = (req, _res, next) => {
  next(req.user ? undefined : unauthenticated());
};

/** 401 when signed out, 403 when signed in with none of `roles`. */
export function requireRole(...roles: StaffRole[]): RequestHandler {
  return (req: Request, _res: Response, next: NextFunction) => {
    if (!req.user) return next(unauthenticated());
    if (!roles.includes(req.user.role)) return next(forbidden());
    next();
  };
}

/** The signed-in actor of a request that passed a guard. */
export function actorOf(req: Request): Actor {
  if (!req.user) throw unauthenticated();
  return req.user;
}
