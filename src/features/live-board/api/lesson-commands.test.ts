import { describe, expect, it } from "vitest";
import { ApiError } from "@/lib/api-client";
import { sendCommand, TIMEOUT_MESSAGE, type CommandSocket } from "./lesson-commands";

/** A socket whose acknowledgement is whatever the test says (or a timeout). */
function fakeSocket(answer: () => Promise<unknown>) {
  const sent: { event: string; payload: unknown; timeout: number }[] = [];
  const socket: CommandSocket = {
    timeout: (ms) => ({
      emitWithAck: (event, payload) => {
        sent.push({ event, payload, timeout: ms });
        return answer();
      },
    }),
  };
  return { socket, sent };
}

describe("lesson commands", () => {
  it("sends the event with its payload and an 8 s timeout, and returns the ack's data", async () => {
    const { socket, sent } = fakeSocket(async () => ({ data: { phase: "observe" } }));
    const reply = await sendCommand(socket, "trial:phase", { trialId: "t", phase: "observe" });
    expect(reply).toEqual({ phase: "observe" });
    expect(sent).toEqual([{ event: "trial:phase", payload: { trialId: "t", phase: "observe" }, timeout: 8000 }]);
  });

  it("turns an error ack into an ApiError with the server's message and field messages", async () => {
    const { socket } = fakeSocket(async () => ({
      error: { code: "validation_failed", message: "Check the set-up.", fields: { "params.potHeight": ["Height of the pot above the floor must be from 0.2 to 3 m"] } },
    }));
    const error = await sendCommand(socket, "trial:setup", {
      trialId: "t",
      rig: "fountain",
      params: { potHeight: 9 },
      question: { kind: "number", prompt: "How high?", quantity: "rise", unit: "cm" },
    }).catch((e: unknown) => e);
    expect(error).toBeInstanceOf(ApiError);
    expect((error as ApiError).message).toBe("Check the set-up.");
    expect((error as ApiError).code).toBe("validation_failed");
    expect((error as ApiError).fieldMessage("params.potHeight")).toMatch(/from 0.2 to 3 m/);
  });

  it("says the server did not answer when the ack times out", async () => {
    const { socket } = fakeSocket(() => Promise.reject(new Error("operation has timed out")));
    await expect(sendCommand(socket, "lesson:end", { lessonId: "l" }, 10)).rejects.toThrow(TIMEOUT_MESSAGE);
  });

  it("refuses an answer that is neither data nor error", async () => {
    const { socket } = fakeSocket(async () => "ok");
    await expect(sendCommand(socket, "lesson:end", { lessonId: "l" })).rejects.toMatchObject({ code: "bad_response" });
  });
});
