import { describe, expect, it } from "vitest";
import { fieldErrorsFromIssues } from "./errors";
import { updateStaffInputSchema } from "./staff";

const SCIENCE = "5b0e7a52-4d0c-4b8e-9a51-0d6f1c2b3a41";

describe("changing a member of staff", () => {
  it.each([
    [{ role: "teacher" }],
    [{ departmentId: SCIENCE }],
    [{ departmentId: null }],
    [{ role: "head_of_department", departmentId: SCIENCE }],
  ])("accepts %j", (input) => {
    expect(updateStaffInputSchema.safeParse(input)).toMatchObject({ success: true, data: input });
  });

  it("refuses a request that changes nothing", () => {
    const result = updateStaffInputSchema.safeParse({});
    expect(result.success).toBe(false);
    expect(fieldErrorsFromIssues(result.error!.issues)).toEqual({ _form: ["Choose a new role or department to save."] });
  });

  it("refuses a department that is not an id, with a message for the department field", () => {
    const result = updateStaffInputSchema.safeParse({ departmentId: "Science" });
    expect(result.success).toBe(false);
    expect(fieldErrorsFromIssues(result.error!.issues)).toEqual({ departmentId: ["Choose a department from the list."] });
  });

  it("refuses an unknown role", () => {
    const result = updateStaffInputSchema.safeParse({ role: "owner", departmentId: SCIENCE });
    expect(result.success).toBe(false);
    expect(Object.keys(fieldErrorsFromIssues(result.error!.issues))).toEqual(["role"]);
  });
});
