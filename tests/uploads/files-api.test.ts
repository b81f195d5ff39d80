import { afterAll, beforeAll, describe, expect } from "vitest";
import { mkdtemp, readdir, rm } from "node:fs/promises";
import { tmpdir } from "node:os";
import path from "node:path";
import { NextRequest } from "next/server";
import { AuditEvent, OrderEvent, Upload, type Order } from "@/entities";
import { GET as listFiles, POST as postFile } from "@/app/api/orders/[id]/files/route";
import { GET as getFile } from "@/app/api/files/[id]/route";
import { getEm } from "@/lib/db/orm";
import { createStaffUser } from "@/lib/users/staff";
import type { Role } from "@/lib/auth/roles";
import { authRequest, sessionCookie, signUpVerified, uniqueEmail } from "../setup/auth-requests";
import { dbTest, requireDatabase } from "../setup/db";
import { createTestOrder } from "../setup/test-orders";

const PASSWORD = "a-long-password-1";
const BASE = "http://127.0.0.1:3999";

// A 1×1 PNG and a tiny but well-formed PDF, made here rather than kept as fixtures.
const PNG = Buffer.from(
  "iVBORw0KGgoAAAANSUhEUgAAAAEAAAABCAYAAAAfFcSJAAAADUlEQVR42mP8z8BQDwAEhQGAhKmMIQAAAABJRU5ErkJggg==",
  "base64",
);
const PDF = Buffer.from(
  "%PDF-1.4\n1 0 obj<</Type/Catalog/Pages 2 0 R>>endobj\n2 0 obj<</Type/Pages/Kids[3 0 R]/Count 1>>endobj\n" +
    "3 0 obj<</Type/Page/Parent 2 0 R/MediaBox[0 0 200 200]>>endobj\ntrailer<</Root 1 0 R>>\n%%EOF\n",
);

let uploadsDir: string;
async function signIn(role: Role): Promise<{ cookie: string; userId: string }> {
  const email = uniqueEmail(role);
  if (role === "customer") await signUpVerified({ name: "Cust Omer", email, password: PASSWORD });
  else await createStaffUser({ name: `A ${role}`, email, role, password: PASSWORD }, null);
  const res = await authRequest("/sign-in/email", { email, password: PASSWORD });
  expect(res.status).toBe(200);
  const body = (await res.json()) as { user: { id: string } };
  return { cookie: sessionCookie(res), userId: body.user.id };
}

function upload(orderId: string, cookie: string, file: Blob, filename: string) {
  const form = new FormData();
  form.set("file", file, filename);
  const req = new NextRequest(`${BASE}/api/orders/${orderId}/files`, {
    method: "POST",
    body: form,
    headers: { cookie },
  });
  return postFile(req, { params: Promise.resolve({ id: orderId }) });
}

function list(orderId: string, cookie: string) {
  return listFiles(new NextRequest(`${BASE}/api/orders/${orderId}/files`, { headers: { cookie } }), {
    params: Promise.resolve({ id: orderId }),
  });
}

function download(fileId: string, cookie: string) {
  return getFile(new NextRequest(`${BASE}/api/files/${fileId}`, { headers: { cookie } }), {
    params: Promise.resolve({ id: fileId }),
  });
}

let alice: { cookie: string; userId: string };
let bob: { cookie: string; userId: string };
let counterStaff: { cookie: string; userId: string };
let floor: { cookie: string; userId: string };
let aliceOrder: Order;

beforeAll(async () => {
  uploadsDir = await mkdtemp(path.join(tmpdir(), "yokeline-uploads-"));
  process.env.UPLOADS_DIR = uploadsDir;
  requireDatabase();
  [alice, bob, counterStaff, floor] = [
    await signIn("customer"),
    await signIn("customer"),
    await signIn("counter"),
    await signIn("floor"),
  ];
  aliceOrder = await createTestOrder(await getEm(), { userId: alice.userId });
});

afterAll(async () => {
  await rm(uploadsDir, { recursive: true, force: true });
});

describe("order files", () => {
  dbTest(
    "a customer attaches a PNG to their order: 201, row, timeline event, audit entry, bytes served back",
    async () => {
      const res = await upload(
        aliceOrder.id,
        alice.cookie,
        new Blob([PNG], { type: "application/octet-stream" }),
        "../../etc/propshaft photo.png",
      );
      expect(res.status).toBe(201);
      const { data } = (await res.json()) as {
        data: {
          id: string;
          filename: string;
          contentType: string;
          kind: string;
          sizeBytes: number;
          url: string;
        };
      };
      expect(data).toMatchObject({
        filename: "propshaft photo.png",
        contentType: "image/png",
        kind: "image",
        sizeBytes: PNG.length,
        url: `/api/files/${data.id}`,
      });

      const em = await getEm();
      const row = await em.findOneOrFail(Upload, { id: data.id });
      expect(row.sha256).toMatch(/^[0-9a-f]{64}$/);
      expect(row.storageKey).not.toContain("photo");
      expect(
        await em.count(OrderEvent, {
          order: aliceOrder.id,
          kind: "file",
          label: "Photo added: propshaft photo.png",
        }),
      ).toBe(1);
      expect(
        await em.count(AuditEvent, { action: "order.file.add", subjectId: aliceOrder.id }),
      ).toBeGreaterThanOrEqual(1);
      // Stored under the generated key inside UPLOADS_DIR, nowhere else.
      expect((await readdir(path.join(uploadsDir, row.storageKey.slice(0, 2)))).sort()).toEqual([
        row.storageKey,
        `${row.storageKey}.json`,
      ]);

      const file = await download(data.id, alice.cookie);
      expect(file.status).toBe(200);
      expect(file.headers.get("content-type")).toBe("image/png");
      expect(file.headers.get("x-content-type-options")).toBe("nosniff");
      // Opened on its own the photo is a sandboxed document that can only show itself.
      expect(file.headers.get("content-security-policy")).toBe(
        "sandbox; default-src 'none'; img-src 'self'; style-src 'unsafe-inline'",
      );
      expect(file.headers.get("cache-control")).toMatch(/^private/);
      expect(file.headers.get("content-disposition")).toBe(
        `inline; filename="propshaft photo.png"; filename*=UTF-8''propshaft%20photo.png`,
      );
      expect(Buffer.from(await file.arrayBuffer()).equals(PNG)).toBe(true);
    },
  );

  dbTest("a PDF measurement sheet is accepted and served as an application/pdf download", async () => {
    const res = await upload(aliceOrder.id, alice.cookie, new Blob([PDF], { type: "image/png" }), "Maße.pdf");
    expect(res.status).toBe(201);
    const { data } = (await res.json()) as { data: { id: string; contentType: string; kind: string } };
    expect(data).toMatchObject({ contentType: "application/pdf", kind: "pdf" });
    const file = await download(data.id, alice.cookie);
    expect(file.headers.get("content-type")).toBe("application/pdf");
    // PDFs are downloaded rather than shown, and sandboxed should a browser show them anyway.
    expect(file.headers.get("content-disposition")).toBe(
      `attachment; filename="Ma_e.pdf"; filename*=UTF-8''Ma%C3%9Fe.pdf`,
    );
    expect(file.headers.get("content-security-policy")).toMatch(/^sandbox; default-src 'none'/);
  });

  dbTest(
    "a text file renamed .png (and claimed as image/png) is refused by sniffing: 422 on field file",
    async () => {
      const res = await upload(
        aliceOrder.id,
        alice.cookie,
        new Blob(["just some text, not a picture\n"], { type: "image/png" }),
        "photo.png",
      );
      expect(res.status).toBe(422);
      const body = (await res.json()) as {
        error: { code: string; message: string; fields: Record<string, string> };
      };
      expect(body.error.code).toBe("invalid");
      expect(body.error.fields.file).toBe(
        "Only photos (JPEG, PNG, WebP, HEIC) and PDF files can be attached.",
      );
    },
  );

  dbTest("a file over 10 MB is refused with 413 and a clear message", async () => {
    const big = Buffer.alloc(10 * 1024 * 1024 + 1);
    PNG.copy(big);
    const res = await upload(aliceOrder.id, alice.cookie, new Blob([big], { type: "image/png" }), "huge.png");
    expect(res.status).toBe(413);
    const body = (await res.json()) as {
      error: { code: string; message: string; fields: Record<string, string> };
    };
    expect(body.error).toMatchObject({ code: "too_large", fields: { file: "Files can be at most 10 MB." } });
  });

  dbTest("a missing file field is a 422 naming file", async () => {
    const req = new NextRequest(`${BASE}/api/orders/${aliceOrder.id}/files`, {
      method: "POST",
      body: new FormData(),
      headers: { cookie: alice.cookie },
    });
    const res = await postFile(req, { params: Promise.resolve({ id: aliceOrder.id }) });
    expect(res.status).toBe(422);
    expect(
      ((await res.json()) as { error: { fields: Record<string, string> } }).error.fields.file,
    ).toBeTruthy();
  });

  dbTest("another customer can neither list, download nor attach to the order: 404", async () => {
    const mine = (await (await list(aliceOrder.id, alice.cookie)).json()) as { data: Array<{ id: string }> };
    expect(mine.data.length).toBeGreaterThanOrEqual(2);
    const fileId = mine.data[0]!.id;
    expect((await list(aliceOrder.id, bob.cookie)).status).toBe(404);
    expect((await download(fileId, bob.cookie)).status).toBe(404);
    expect((await upload(aliceOrder.id, bob.cookie, new Blob([PNG]), "x.png")).status).toBe(404);
    // No session at all.
    expect((await download(fileId, "")).status).toBe(401);
  });

  dbTest("staff see the files; the counter may attach, the floor may only look", async () => {
    const listed = await list(aliceOrder.id, counterStaff.cookie);
    expect(listed.status).toBe(200);
    const { data } = (await listed.json()) as { data: Array<{ id: string; uploadedBy: string | null }> };
    expect(data[0]?.uploadedBy).toBe("Cust Omer");
    expect((await download(data[0]!.id, counterStaff.cookie)).status).toBe(200);
    expect((await download(data[0]!.id, floor.cookie)).status).toBe(200);
    expect((await list(aliceOrder.id, floor.cookie)).status).toBe(200);
    expect((await upload(aliceOrder.id, counterStaff.cookie, new Blob([PNG]), "counter.png")).status).toBe(
      201,
    );
    expect((await upload(aliceOrder.id, floor.cookie, new Blob([PNG]), "floor.png")).status).toBe(403);
  });

  dbTest("unknown or malformed file ids are 404", async () => {
    expect((await download("00000000-0000-4000-8000-000000000000", counterStaff.cookie)).status).toBe(404);
    expect((await download("..%2F..%2Fetc%2Fpasswd", counterStaff.cookie)).status).toBe(404);
  });
});
