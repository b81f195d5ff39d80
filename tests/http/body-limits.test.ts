import { afterAll, beforeAll, describe, expect, test } from "vitest";
import type http from "node:http";
import { NextRequest } from "next/server";
import { readBody, readJson, jsonDepth, JSON_BODY_LIMIT_BYTES, MAX_JSON_DEPTH } from "@/lib/http/body";
import { AppError } from "@/lib/http/errors";
import { POST as evaluate } from "@/app/api/designs/evaluate/route";
import { POST as webhook } from "@/app/api/payments/webhook/route";
import { POST as authPost } from "@/app/api/auth/[...all]/route";
import { POST as signIn } from "@/app/api/sign-in/route";
import { chunkedPost, serve } from "./chunked-http";

/** A body that never ends on its own; counts what the reader pulled. */
function endlessBody(chunkBytes = 64 * 1024) {
  const state = { pulled: 0, cancelled: false };
  const stream = new ReadableStream<Uint8Array>({
    pull(controller) {
      state.pulled += chunkBytes;
      controller.enqueue(new Uint8Array(chunkBytes).fill(0x20));
    },
    cancel() {
      state.cancelled = true;
    },
  });
  return { stream, state };
}

describe("readBody", () => {
  test("a body without a length is cut off just past the cap and its stream cancelled (413)", async () => {
    const { stream, state } = endlessBody();
    const req = new Request("http://127.0.0.1/x", {
      method: "POST",
      body: stream,
      duplex: "half",
    } as RequestInit);
    const error = await readBody(req, 1024 * 1024).catch((e: unknown) => e);
    expect(error).toBeInstanceOf(AppError);
    expect((error as AppError).code).toBe("too_large");
    expect((error as AppError).message).toBe("The request body is larger than 1 MB.");
    expect(state.cancelled).toBe(true);
    // Never buffered much more than the cap (a few chunks of read-ahead at most).
    expect(state.pulled).toBeLessThan(1024 * 1024 + 5 * 64 * 1024);
  });

  test("a declared Content-Length over the cap is refused before any byte is read", async () => {
    const { stream, state } = endlessBody();
    const req = new Request("http://127.0.0.1/x", {
      method: "POST",
      body: stream,
      duplex: "half",
      headers: { "content-length": String(50 * 1024 * 1024) },
    } as RequestInit);
    await expect(readBody(req, 1024)).rejects.toMatchObject({ code: "too_large" });
    expect(state.pulled).toBeLessThanOrEqual(64 * 1024); // at most the stream's own first pull
  });

  test("a body under the cap comes back whole", async () => {
    const text = "x".repeat(5000);
    const bytes = await readBody(new Request("http://127.0.0.1/x", { method: "POST", body: text }), 5000);
    expect(new TextDecoder().decode(bytes)).toBe(text);
  });
});

describe("readJson", () => {
  test("100 000 nested arrays are refused quickly as too deep, without parsing", async () => {
    const deep = "[".repeat(100_000) + "]".repeat(100_000);
    const started = performance.now();
    const error = await readJson(new Request("http://127.0.0.1/x", { method: "POST", body: deep })).catch(
      (e: unknown) => e,
    );
    expect(performance.now() - started).toBeLessThan(1000);
    expect(error).toMatchObject({
      code: "invalid",
      fields: { body: `The request body nests more than ${MAX_JSON_DEPTH} levels deep.` },
    });
  });

  test("depth ignores brackets inside strings", () => {
    expect(jsonDepth('{"a":"[[[[[[[[[[[[[[[[[[[[[[[[[[[[[[[[[[[[[[[[[[[[[[[[[[[[[[[[[[[[[[\\"[["}')).toBe(1);
    expect(jsonDepth("[[1],[2,[3]]]")).toBe(3);
  });

  test("a form where JSON is expected is a 422 on body", async () => {
    const form = new FormData();
    form.set("lengthMm", "1200");
    await expect(
      readJson(new Request("http://127.0.0.1/x", { method: "POST", body: form })),
    ).rejects.toMatchObject({ code: "invalid", fields: { body: expect.stringMatching(/not as a form/) } });
  });

  test("a NUL in any string is a 422 naming its field (PostgreSQL stores no NUL in text)", async () => {
    const post = (body: string) => readJson(new Request("http://127.0.0.1/x", { method: "POST", body }));
    await expect(
      post(String.raw`{"name":"ok","application":{"lines":["a","b\u0000c"]}}`),
    ).rejects.toMatchObject({
      code: "invalid",
      fields: { "application.lines[1]": expect.stringMatching(/NUL/) },
    });
    await expect(post(String.raw`"\u0000"`)).rejects.toMatchObject({
      fields: { body: expect.stringMatching(/NUL/) },
    });
    // An escaped backslash before "u0000" is plain text, and is let through.
    await expect(post(String.raw`{"name":"C:\\u0000"}`)).resolves.toEqual({ name: String.raw`C:\u0000` });
  });

  test("the JSON cap is about 1 MB", () => {
    expect(JSON_BODY_LIMIT_BYTES).toBe(1024 * 1024);
  });
});

describe("chunked bodies over real HTTP are refused early with 413", () => {
  const servers: http.Server[] = [];
  afterAll(() => servers.forEach((s) => s.close()));

  const cases: Array<{
    name: string;
    handler: (req: NextRequest) => Promise<Response>;
    path: string;
    contentType?: string;
    limit: number;
  }> = [
    {
      name: "a JSON endpoint (1 MB)",
      handler: (r) => evaluate(r, { params: Promise.resolve({}) }),
      path: "/api/designs/evaluate",
      limit: 1024 * 1024,
    },
    {
      name: "the payments webhook (256 kB)",
      handler: (r) => webhook(r),
      path: "/api/payments/webhook",
      limit: 256 * 1024,
    },
    {
      name: "the auth library's routes (16 kB)",
      handler: (r) => authPost(r),
      path: "/api/auth/sign-in/email",
      limit: 16 * 1024,
    },
    {
      name: "the sign-in form (16 kB)",
      handler: (r) => signIn(r),
      path: "/api/sign-in",
      contentType: "application/x-www-form-urlencoded",
      limit: 16 * 1024,
    },
  ];

  for (const c of cases) {
    test(`${c.name}: 50 MB sent without a length gets 413 too_large before much is sent`, async () => {
      const { server, port } = await serve(c.handler);
      servers.push(server);
      const res = await chunkedPost(port, c.path, 50 * 1024 * 1024, c.contentType);
      expect(res.status).toBe(413);
      expect(JSON.parse(res.body)).toMatchObject({
        error: { code: "too_large", message: expect.stringMatching(/larger than/) },
      });
      // Socket buffers let a few MB through before the answer is seen; far below the 50 MB.
      expect(res.writtenBytes).toBeLessThan(c.limit + 8 * 1024 * 1024);
    });
  }
});

beforeAll(() => {
  process.env.STRIPE_WEBHOOK_SECRET ??= "whsec_test_body_limits";
});
