import { describe, expect } from "vitest";
import { NextRequest } from "next/server";
import { StaffInvitation, User } from "@/entities";
import { getEm } from "@/lib/db/orm";
import { authorize } from "@/lib/auth/guard";
import { createFirstOwner } from "@/lib/auth/first-owner";
import { appUrl } from "@/lib/http/app-url";
import { POST as acceptStaffInvite } from "@/app/api/auth/staff-invite/route";
import { authRequest, sessionCookie, uniqueEmail } from "../setup/auth-requests";
import { dbTest } from "../setup/db";

function accept(body: unknown) {
  return acceptStaffInvite(
    new NextRequest(`${appUrl()}/api/auth/staff-invite`, {
      method: "POST",
      headers: { "content-type": "application/json", origin: appUrl() },
      body: JSON.stringify(body),
    }),
    { params: Promise.resolve({}) },
  );
}

describe("the first owner's one-time link", () => {
  dbTest("sets the password once and signs the owner in; then no second first owner", async () => {
    const em = await getEm();
    // This database may hold owners made by other tests; the command refuses then.
    const owners = await em.count(User, { role: "owner" });
    const email = uniqueEmail("first-owner");
    if (owners > 0) {
      await expect(createFirstOwner(email)).rejects.toMatchObject({ code: "conflict" });
      expect(await em.count(StaffInvitation, { email })).toBe(0);
      return;
    }
    const { link, expiresAt } = await createFirstOwner(email);
    // 24 hours, as the command promises.
    expect(Math.abs(expiresAt.getTime() - Date.now() - 24 * 3600_000)).toBeLessThan(60_000);
    const token = new URL(link).searchParams.get("token")!;
    // No account yet: nothing to sign in to, and no second link while this one works.
    expect(await em.count(User, { email })).toBe(0);
    await expect(createFirstOwner(uniqueEmail("other-owner"))).rejects.toMatchObject({ code: "conflict" });

    const res = await accept({ token, name: "First Owner", password: "chosen-password-1" });
    expect(res.status).toBe(201);
    expect(await res.json()).toMatchObject({ home: "/overview" });
    expect(await authorize(null, new Headers({ cookie: sessionCookie(res) }))).toMatchObject({
      email,
      role: "owner",
    });
    const signedIn = await authRequest("/sign-in/email", { email, password: "chosen-password-1" });
    expect(signedIn.status).toBe(200);
    expect((await accept({ token, name: "Again", password: "another-password-1" })).status).toBe(404);
    await expect(createFirstOwner(uniqueEmail("second-owner"))).rejects.toMatchObject({ code: "conflict" });
  });
});
