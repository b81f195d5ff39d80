import { describe, expect } from "vitest";
import { authRequest, uniqueEmail } from "../setup/auth-requests";
import { dbTest } from "../setup/db";

describe("sign-in rate limit", () => {
  dbTest("repeated bad passwords from one client are refused with 429", async () => {
    const email = uniqueEmail("target");
    await authRequest(
      "/sign-up/email",
      { name: "Target", email, password: "the-right-password" },
      "192.0.2.50",
    );
    const ip = "192.0.2.77";
    const statuses: number[] = [];
    for (let i = 0; i < 12; i += 1) {
      const res = await authRequest("/sign-in/email", { email, password: `wrong-password-${i}` }, ip);
      statuses.push(res.status);
    }
    expect(statuses.slice(0, 3).every((s) => s === 401)).toBe(true);
    expect(statuses).toContain(429);
    // Once limited, even the right password waits out the window…
    const right = await authRequest("/sign-in/email", { email, password: "the-right-password" }, ip);
    expect(right.status).toBe(429);
    // …while another client is unaffected.
    const other = await authRequest(
      "/sign-in/email",
      { email, password: "the-right-password" },
      "192.0.2.78",
    );
    expect(other.status).toBe(200);
  });
});
