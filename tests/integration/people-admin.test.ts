import { describe, expect, test } from "vitest";
import { signedIn } from "../support/http";
import { addPerson } from "../support/people";

/**
 * The administrator's seat (lib/users/admin-seat.ts, db/queries/users.ts). Common practice in
 * multi-user tools: the last administrator cannot remove themselves, or nobody could manage people.
 */
describe("the last administrator's seat", () => {
  test("an administrator may step down while another remains; the one left may not", async () => {
    const email = "second-admin@scarpline.test";
    const id = await addPerson(email, { role: "admin", password: "people-pass-1" });
    const second = await signedIn(email, "people-pass-1");
    const down = await second.request(`/api/users/${id}`, { method: "PATCH", json: { role: "engineer" } });
    expect(down.status).toBe(200);
    expect((await down.json()).user.role).toBe("engineer");
    // Their own sessions ended with the change.
    expect((await second.request("/api/users")).status).toBe(401);

    const admin = await signedIn("admin@scarpline.test");
    const me = (await (await admin.request("/api/auth/session")).json()).user.id as number;
    const refused = await admin.request(`/api/users/${me}`, { method: "PATCH", json: { role: "reviewer" } });
    expect(refused.status).toBe(409);
    const error = (await refused.json()).error;
    expect(error.fields.role).toEqual([expect.stringMatching(/at least one active administrator/)]);
    const users = (await (await admin.request("/api/users")).json()).users as { id: number; role: string }[];
    expect(users.find((u) => u.id === me)?.role).toBe("admin");
  });
});
