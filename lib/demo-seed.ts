import "server-only";
import { Customer, Design, Shop, ShopConfig, User } from "@/entities";
import type { CurrentUser } from "@/lib/auth/guard";
import { placeOrder } from "@/lib/orders/place-order";
import streetTruck from "@/examples/street-truck.json";
import compoundOffset from "@/examples/compound-offset.json";
import { defaultCatalogue } from "@/lib/driveline";
import { defaultPriceBook } from "@/lib/pricing/price-book";
import { getEm } from "@/lib/db/orm";
import { createStaffUser } from "@/lib/users/staff";
import { auth } from "@/lib/auth/server";
import { DEMO_CUSTOMERS, DEMO_PASSWORD, DEMO_PHONE_CUSTOMERS, DEMO_STAFF } from "@/lib/demo";
import { isDemo } from "@/lib/shop/shop";
import { seedDemoHistory } from "@/lib/demo/history";

/** Outside demo mode: neutral details the owner replaces under Overview. */
const PLACEHOLDER_SHOP = {
  name: "Your shop",
  addressLines: "",
  phone: "",
  email: "",
};

const DEMO_SHOP = {
  name: "Tallgrass Driveline Works",
  addressLines: "1840 Foundry Road\nMillbrook, KS 67599",
  phone: "(555) 010-4420",
  email: "shop@tallgrass.example",
};

/**
 * Seeds an empty database. Always the shop row and its configuration; in demo mode
 * (YOKELINE_DEMO=1) also the invented demo shop's details, one user per staff role with the
 * published demo password, customers with accounts, one known only by phone, a few hundred
 * orders of past months in every state (lib/demo/history.ts) and two new orders.
 * Outside demo mode no account exists afterwards: the first owner comes from `npm run owner:create`.
 * Does nothing when a shop exists. Returns whether it seeded.
 */
export async function seedDemoShop(demo: boolean = isDemo()): Promise<boolean> {
  const em = await getEm();
  if (await em.findOne(Shop, { id: 1 })) return false;

  em.create(Shop, {
    id: 1,
    ...(demo ? DEMO_SHOP : PLACEHOLDER_SHOP),
    currency: "USD",
    updatedAt: new Date(),
  });
  em.create(ShopConfig, {
    id: 1,
    catalogue: defaultCatalogue,
    settings: {},
    priceBook: defaultPriceBook,
    updatedAt: new Date(),
  });
  await em.flush();
  if (!demo) return true;

  for (const s of DEMO_STAFF) {
    await createStaffUser({ name: s.name, email: s.email, role: s.role, password: DEMO_PASSWORD }, null);
  }

  const ctx = await auth.$context;
  for (const c of DEMO_CUSTOMERS) {
    const user = await ctx.internalAdapter.createUser(
      { email: c.email, name: c.name, emailVerified: true, role: "customer" },
      { method: "admin" },
    );
    await ctx.internalAdapter.linkAccount({
      userId: user.id,
      providerId: "credential",
      accountId: user.id,
      password: await ctx.password.hash(DEMO_PASSWORD),
    });
  }
  // The sign-up hook made their customer records; add what the counter knows about them.
  const fill = em.fork();
  const byEmail = new Map((await fill.find(Customer, {})).map((c) => [c.email, c]));
  for (const c of DEMO_CUSTOMERS) {
    const row = byEmail.get(c.email);
    if (row) fill.assign(row, { company: c.company, phone: c.phone });
  }
  for (const c of DEMO_PHONE_CUSTOMERS) {
    fill.create(Customer, { ...c, createdAt: new Date() });
  }
  await fill.flush();
  await seedDemoHistory();
  await seedDemoOrders();
  return true;
}

/** Two open orders so the desk and the customer screens have something to show (demo data). */
async function seedDemoOrders(): Promise<void> {
  const em = await getEm();
  const wendell = await em.findOneOrFail(
    Customer,
    { email: DEMO_CUSTOMERS[1].email },
    { populate: ["user"] },
  );
  const harlan = await em.findOneOrFail(Customer, { email: DEMO_PHONE_CUSTOMERS[0].email });
  const counter = await em.findOneOrFail(User, { email: DEMO_STAFF[1].email });
  const asUser = (u: User): CurrentUser => ({ id: u.id, name: u.name, email: u.email, role: u.role });

  const drafts = [
    {
      customer: wendell,
      by: wendell.user!,
      name: "Rear shaft, 1979 pickup",
      design: streetTruck,
      use: "street",
      description: "1979 half-ton pickup, 350 V8, 3-speed automatic",
    },
    {
      customer: harlan,
      by: counter,
      name: "Feed-mixer drive",
      design: compoundOffset,
      use: "industrial",
      description: "Feed mixer on the home farm, offset gearbox",
    },
  ];
  for (const d of drafts) {
    const design = em.create(Design, {
      name: d.name,
      design: d.design,
      application: { description: d.description, use: d.use },
      customer: d.customer,
      createdBy: d.by,
    });
    await em.flush();
    await placeOrder(asUser(d.by), {
      designIds: [design.id],
      fulfilment: "pickup",
      customerId: d.customer.id,
    });
  }
}
