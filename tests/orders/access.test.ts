import { describe, expect } from "vitest";
import { NextRequest } from "next/server";
import { getEm } from "@/lib/db/orm";
import { loadOrderForUser } from "@/lib/orders/access";
import { listOrders } from "@/lib/orders/queries";
import { placeOrder } from "@/lib/orders/place-order";
import { POST as checkoutPost } from "@/app/api/orders/[id]/checkout/route";
import { createStaffUser } from "@/lib/users/staff";
import { authRequest, sessionCookie, uniqueEmail } from "../setup/auth-requests";
import { dbTest } from "../setup/db";
import { newCustomer, saveDesign } from "../setup/orders";

describe("who sees an order", () => {
  dbTest(
    "a customer never sees another customer's order: not in their list, 404 when asked by id",
    async () => {
      const a = await newCustomer();
      const b = await newCustomer();
      const order = await placeOrder(a.user, {
        designIds: [(await saveDesign(a.customer, a.user.id)).id],
        fulfilment: "pickup",
      });
      const em = await getEm();

      await expect(loadOrderForUser(em, a.user, order.id)).resolves.toMatchObject({ id: order.id });
      await expect(loadOrderForUser(em, b.user, order.id)).rejects.toMatchObject({ code: "not_found" });
      await expect(loadOrderForUser(em, b.user, "not-a-uuid")).rejects.toMatchObject({ code: "not_found" });
      expect((await listOrders(em, a.user)).map((o) => o.id)).toContain(order.id);
      expect((await listOrders(em, b.user)).map((o) => o.id)).not.toContain(order.id);

      // Over HTTP too: B cannot open a checkout on A's order.
      const signIn = await authRequest("/sign-in/email", {
        email: b.user.email,
        password: "a-long-password-1",
      });
      const res = await checkoutPost(
        new NextRequest(`http://127.0.0.1/api/orders/${order.id}/checkout`, {
          method: "POST",
          headers: { cookie: sessionCookie(signIn) },
        }),
        { params: Promise.resolve({ id: order.id }) },
      );
      expect(res.status).toBe(404);
    },
  );

  dbTest("the counter and the floor see every order", async () => {
    const a = await newCustomer();
    const order = await placeOrder(a.user, {
      designIds: [(await saveDesign(a.customer, a.user.id)).id],
      fulfilment: "pickup",
    });
    const em = await getEm();
    for (const role of ["counter", "floor"] as const) {
      const staff = await createStaffUser(
        { name: `S ${role}`, email: uniqueEmail(role), role, password: "a-long-password-1" },
        null,
      );
      const user = { id: staff.id, name: staff.name, email: staff.email, role };
      await expect(loadOrderForUser(em, user, order.id)).resolves.toMatchObject({ id: order.id });
    }
  });
});
