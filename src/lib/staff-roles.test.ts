import { describe, expect, it } from "vitest";
import { STAFF_ROLES, STAFF_ROLE_LABELS, TEACHING_ROLES } from "@contracts/staff";
import { ROLE_LABELS, isTeachingRole } from "./staff-roles";

describe("client copy of the staff roles", () => {
  it("uses the same labels as the contract", () => {
    expect(ROLE_LABELS).toEqual(STAFF_ROLE_LABELS);
  });
  it("agrees with the contract on who teaches", () => {
    for (const role of STAFF_ROLES) expect(isTeachingRole(role)).toBe(TEACHING_ROLES.includes(role));
  });
});
