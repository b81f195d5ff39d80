import { describe, expect } from "vitest";
import { User } from "@/entities";
import { getEm } from "@/lib/db/orm";
import { createFirstOwner } from "@/lib/auth/first-owner";
import { authRequest, uniqueEmail } from "../setup/auth-requests";
import { dbTest } from "../setup/db";

describe("the first owner's one-time link", () => {
  dbTest("sets the password once; then the owner signs in", async () => {
    const em = await getEm();
    // This database may hold owners made by other tests; the command refuses then.
    const owners = await em.count(User, { role: "owner" });
    const email = uniqueEmail("first-owner");
    if (owners > 0) {
      await expect(createFirstOwner(email)).rejects.toMatchObject({ code: "conflict" });
      return;
    }
    const { link } = await createFirstOwner(email);
    const token = new URL(link).searchParams.get("token")!;
    expect((await authRequest("/sign-in/email", { email, password: "chosen-password-1" })).status).toBe(401);
    expect((await authRequest("/reset-password", { token, newPassword: "chosen-password-1" })).status).toBe(
      200,
    );
    const signedIn = await authRequest("/sign-in/email", { email, password: "chosen-password-1" });
    expect(signedIn.status).toBe(200);
    expect(((await signedIn.json()) as { user: { role: string } }).user.role).toBe("owner");
    expect((await authRequest("/reset-password", { token, newPassword: "another-password-1" })).status).toBe(
      400,
    );
    await expect(createFirstOwner(uniqueEmail("second-owner"))).rejects.toMatchObject({ code: "conflict" });
  });
});
