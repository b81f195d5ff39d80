import { describe, expect, vi } from "vitest";
import { authorize } from "@/lib/auth/guard";
import { auth, authPool } from "@/lib/auth/server";
import { forgetSessions } from "@/lib/auth/session-cache";
import { createStaffUser, setStaffActive } from "@/lib/users/staff";
import { authRequest, sessionCookie, uniqueEmail } from "../setup/auth-requests";
import { dbTest } from "../setup/db";

const PASSWORD = "a-long-password-1";

async function staff(role: "owner" | "floor"): Promise<{ id: string; headers: Headers; cookie: string }> {
  const email = uniqueEmail(role);
  const user = await createStaffUser({ name: `Cache ${role}`, email, role, password: PASSWORD }, null);
  const res = await authRequest("/sign-in/email", { email, password: PASSWORD });
  expect(res.status).toBe(200);
  const cookie = sessionCookie(res);
  return { id: user.id, headers: new Headers({ cookie }), cookie };
}

// The guard remembers which session a cookie resolved to (lib/auth/session-cache.ts); each case
// first makes sure the cookie is remembered (two reads), then changes the session behind its back.
describe("the remembered session is read live on every request", () => {
  dbTest("a role changed in the database applies on the next request", async () => {
    forgetSessions();
    const floor = await staff("floor");
    await expect(authorize("floor.scan", floor.headers)).resolves.toMatchObject({ role: "floor" });
    await expect(authorize("floor.scan", floor.headers)).resolves.toMatchObject({ role: "floor" });
    await authPool.query("update app_user set role = 'counter', name = 'Renamed' where id = $1", [floor.id]);
    await expect(authorize("floor.scan", floor.headers)).rejects.toMatchObject({ status: 403 });
    await expect(authorize(null, floor.headers)).resolves.toMatchObject({ role: "counter", name: "Renamed" });
  });

  dbTest("signing out, deactivation and expiry refuse the cookie at once", async () => {
    forgetSessions();
    const owner = await staff("owner");
    const a = await staff("floor");
    const b = await staff("floor");
    const c = await staff("floor");
    for (const s of [a, b, c]) {
      await authorize(null, s.headers);
      await expect(authorize(null, s.headers)).resolves.toMatchObject({ id: s.id });
    }
    const out = await authRequest("/sign-out", {}, undefined, a.cookie);
    expect(out.status).toBe(200);
    await expect(authorize(null, a.headers)).rejects.toMatchObject({ status: 401 });

    await setStaffActive({ userId: b.id, active: false }, owner.id);
    await expect(authorize(null, b.headers)).rejects.toMatchObject({ status: 401 });

    await authPool.query(
      "update auth_session set expires_at = now() - interval '1 second' where user_id = $1",
      [c.id],
    );
    await expect(authorize(null, c.headers)).rejects.toMatchObject({ status: 401 });
  });

  dbTest("a cookie with a forged signature is never taken for the remembered one", async () => {
    forgetSessions();
    const floor = await staff("floor");
    await authorize(null, floor.headers);
    const [name, value] = floor.cookie.split("=") as [string, string];
    const token = decodeURIComponent(value).split(".")[0];
    const forged = new Headers({ cookie: `${name}=${encodeURIComponent(`${token}.forged-signature`)}` });
    await expect(authorize(null, forged)).rejects.toMatchObject({ status: 401 });
    await expect(authorize(null, floor.headers)).resolves.toMatchObject({ id: floor.id });
  });
});

describe("a cookie not remembered yet", () => {
  dbTest(
    "requests that arrive together share one read by the auth library, each cookie its own",
    async () => {
      forgetSessions();
      const a = await staff("floor");
      const b = await staff("owner");
      const read = vi.spyOn(auth.api, "getSession");
      try {
        const answers = await Promise.all(
          Array.from({ length: 20 }, (_, i) => authorize(null, i % 2 ? b.headers : a.headers)),
        );
        expect(answers.map((u) => u.id)).toEqual(Array.from({ length: 20 }, (_, i) => (i % 2 ? b.id : a.id)));
        expect(read).toHaveBeenCalledTimes(2);
        // Remembered now: the next requests read the session row, not the auth library.
        await authorize(null, a.headers);
        expect(read).toHaveBeenCalledTimes(2);
        // Once the shared read is over it is not kept: a forgotten cookie is read again.
        forgetSessions();
        await expect(authorize(null, a.headers)).resolves.toMatchObject({ id: a.id });
        expect(read).toHaveBeenCalledTimes(3);
      } finally {
        read.mockRestore();
      }
    },
  );
});
