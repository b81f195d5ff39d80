import { afterAll, beforeAll, describe, expect } from "vitest";
import { mkdtemp, rm } from "node:fs/promises";
import { randomUUID } from "node:crypto";
import { tmpdir } from "node:os";
import path from "node:path";
import { NextRequest } from "next/server";
import { Order, Upload, User } from "@/entities";
import { POST as postFile } from "@/app/api/orders/[id]/files/route";
import { getEm } from "@/lib/db/orm";
import { MAX_FILES_PER_CUSTOMER_PER_DAY, MAX_FILES_PER_ORDER } from "@/lib/uploads";
import { authRequest, sessionCookie, signUpVerified, uniqueEmail } from "../setup/auth-requests";
import { dbTest, requireDatabase } from "../setup/db";
import { createTestOrder } from "../setup/test-orders";
import { chunkedPost, serve } from "../http/chunked-http";

const PASSWORD = "a-long-password-1";
const BASE = "http://127.0.0.1:3999";
const PNG = Buffer.from(
  "iVBORw0KGgoAAAANSUhEUgAAAAEAAAABCAYAAAAfFcSJAAAADUlEQVR42mP8z8BQDwAEhQGAhKmMIQAAAABJRU5ErkJggg==",
  "base64",
);

let uploadsDir: string;
let previousUploadsDir: string | undefined;

async function customer(): Promise<{ cookie: string; userId: string }> {
  const email = uniqueEmail("limits");
  await signUpVerified({ name: "Many Files", email, password: PASSWORD });
  const res = await authRequest("/sign-in/email", { email, password: PASSWORD });
  return { cookie: sessionCookie(res), userId: ((await res.json()) as { user: { id: string } }).user.id };
}

function upload(orderId: string, cookie: string) {
  const form = new FormData();
  form.set("file", new Blob([PNG]), "photo.png");
  return postFile(
    new NextRequest(`${BASE}/api/orders/${orderId}/files`, {
      method: "POST",
      body: form,
      headers: { cookie },
    }),
    { params: Promise.resolve({ id: orderId }) },
  );
}

/** Rows as earlier uploads left them (the limits count the upload table). */
async function existingUploads(order: Order, userId: string, count: number, createdAt = new Date()) {
  const em = await getEm();
  for (let i = 0; i < count; i++) {
    em.create(Upload, {
      order: em.getReference(Order, order.id),
      uploadedBy: em.getReference(User, userId),
      filename: `earlier-${i}.png`,
      contentType: "image/png",
      sizeBytes: PNG.length,
      storageKey: `test-${randomUUID()}`,
      sha256: "0".repeat(64),
      createdAt,
    });
  }
  await em.flush();
}

type ErrorBody = { error: { code: string; message: string; fields: Record<string, string> } };

beforeAll(async () => {
  previousUploadsDir = process.env.UPLOADS_DIR;
  uploadsDir = await mkdtemp(path.join(tmpdir(), "yokeline-limits-"));
  process.env.UPLOADS_DIR = uploadsDir;
  requireDatabase();
});

afterAll(async () => {
  process.env.UPLOADS_DIR = previousUploadsDir;
  await rm(uploadsDir, { recursive: true, force: true });
});

describe("upload bodies", () => {
  dbTest(
    "a 60 MB multipart body sent without a length is refused with 413 before it is all sent",
    async () => {
      const me = await customer();
      const order = await createTestOrder(await getEm(), { userId: me.userId });
      const { server, port } = await serve((req) =>
        postFile(req, { params: Promise.resolve({ id: order.id }) }),
      );
      try {
        const res = await chunkedPost(
          port,
          `/api/orders/${order.id}/files`,
          60 * 1024 * 1024,
          "multipart/form-data; boundary=x",
          { cookie: me.cookie },
        );
        expect(res.status).toBe(413);
        expect(JSON.parse(res.body)).toMatchObject({
          error: { code: "too_large", fields: { file: "Files can be at most 10 MB." } },
        });
        expect(res.writtenBytes).toBeLessThan(20 * 1024 * 1024);
      } finally {
        server.close();
      }
      expect(await (await getEm()).count(Upload, { order: order.id })).toBe(0);
    },
  );
});

describe("file limits per order and per customer a day", () => {
  dbTest(
    `an order takes at most ${MAX_FILES_PER_ORDER} files: the next is a 409 naming the limit`,
    async () => {
      const me = await customer();
      const order = await createTestOrder(await getEm(), { userId: me.userId });
      await existingUploads(order, me.userId, MAX_FILES_PER_ORDER - 1);
      expect((await upload(order.id, me.cookie)).status).toBe(201);
      const res = await upload(order.id, me.cookie);
      expect(res.status).toBe(409);
      const body = (await res.json()) as ErrorBody;
      expect(body.error).toMatchObject({
        code: "conflict",
        message: "An order can have at most 20 files attached.",
        fields: { file: "An order can have at most 20 files attached." },
      });
      expect(await (await getEm()).count(Upload, { order: order.id })).toBe(MAX_FILES_PER_ORDER);
    },
  );

  dbTest(
    `at most ${MAX_FILES_PER_CUSTOMER_PER_DAY} files a day across a customer's orders: the next is a 429; older ones do not count`,
    async () => {
      const me = await customer();
      const em = await getEm();
      const first = await createTestOrder(em, { userId: me.userId });
      const second = await createTestOrder(em, { userId: me.userId });
      const third = await createTestOrder(em, { userId: me.userId });
      const yesterday = new Date(Date.now() - 25 * 60 * 60 * 1000);
      await existingUploads(third, me.userId, 10, yesterday);
      await existingUploads(first, me.userId, 15);
      await existingUploads(second, me.userId, MAX_FILES_PER_CUSTOMER_PER_DAY - 15 - 1);
      expect((await upload(third.id, me.cookie)).status).toBe(201);
      const res = await upload(third.id, me.cookie);
      expect(res.status).toBe(429);
      const body = (await res.json()) as ErrorBody;
      expect(body.error.code).toBe("rate_limited");
      expect(body.error.fields.file).toBe(
        "At most 30 files a day can be attached to one customer's orders; try again tomorrow.",
      );
    },
  );

  dbTest("two uploads at the same moment cannot both take an order's last place", async () => {
    const me = await customer();
    const order = await createTestOrder(await getEm(), { userId: me.userId });
    await existingUploads(order, me.userId, MAX_FILES_PER_ORDER - 1);
    const statuses = (await Promise.all([upload(order.id, me.cookie), upload(order.id, me.cookie)])).map(
      (r) => r.status,
    );
    expect(statuses.sort()).toEqual([201, 409]);
    expect(await (await getEm()).count(Upload, { order: order.id })).toBe(MAX_FILES_PER_ORDER);
  });
});
