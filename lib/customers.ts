import { Customer, User } from "@/entities";
import { getEm } from "@/lib/db/orm";
import { recordAudit } from "@/lib/audit";
import { AppError } from "@/lib/http/errors";

/**
 * Gives a newly signed-up customer their customer record: the one the counter already keeps
 * under that e-mail (a phone customer who now signs up online), or a new one.
 */
export async function linkCustomerToUser(user: {
  id: string;
  name: string;
  email: string;
}): Promise<Customer> {
  const em = await getEm();
  const email = user.email.toLowerCase();
  const existing = await em.findOne(Customer, { email, user: null });
  const customer = existing ?? em.create(Customer, { name: user.name, email, createdAt: new Date() });
  customer.user = em.getReference(User, user.id);
  await em.persistAndFlush(customer);
  return customer;
}

/** The customer record of a signed-in customer, or null. */
export async function customerForUser(userId: string): Promise<Customer | null> {
  const em = await getEm();
  return em.findOne(Customer, { user: userId });
}

export interface CustomerRow {
  id: string;
  name: string;
  email: string;
  phone: string | null;
  company: string | null;
  hasAccount: boolean;
}

/** Every customer, by name, as plain rows for the screens. */
export async function listCustomers(): Promise<CustomerRow[]> {
  const em = await getEm();
  const rows = await em.find(Customer, {}, { orderBy: { name: "asc" } });
  return rows.map((c) => ({
    id: c.id,
    name: c.name,
    email: c.email,
    phone: c.phone ?? null,
    company: c.company ?? null,
    hasAccount: c.user != null,
  }));
}

/** A customer the counter enters for a phone order (no sign-in of their own yet). */
export async function createPhoneCustomer(
  input: { name: string; email: string; phone?: string; company?: string; addressLines?: string },
  actorId: string,
): Promise<CustomerRow> {
  const em = await getEm();
  const email = input.email.toLowerCase();
  if (await em.findOne(Customer, { email })) {
    throw new AppError("conflict", "A customer with that e-mail already exists; pick them from the list.", {
      email: "Already a customer.",
    });
  }
  const customer = em.create(Customer, {
    name: input.name,
    email,
    phone: input.phone || null,
    company: input.company || null,
    addressLines: input.addressLines || null,
  });
  await recordAudit(
    {
      actorId,
      action: "customer.create",
      subjectType: "customer",
      subjectId: customer.id,
      details: { email },
    },
    em,
  );
  await em.flush();
  return {
    id: customer.id,
    name: customer.name,
    email,
    phone: customer.phone ?? null,
    company: customer.company ?? null,
    hasAccount: false,
  };
}
