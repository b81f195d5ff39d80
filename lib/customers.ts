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

/** The text the search matches, as the trigram index `customer_search_trgm_index` has it. */
const SEARCH_TEXT = `lower(name || ' ' || email || ' ' || coalesce(company, '') || ' ' || coalesce(phone, ''))`;
/** The phone's digits alone (index `customer_phone_digits_trgm_index`): "555 0163" finds "(555) 016-3…". */
const PHONE_DIGITS = `regexp_replace(coalesce(phone, ''), '[^0-9]', '', 'g')`;

const likeEscape = (s: string) => s.replace(/[\\%_]/g, (c) => `\\${c}`);

/**
 * The counter's customer search, on the server: every word typed must appear somewhere in the
 * name, e-mail, company or phone (any capitals); a word of digits also matches the phone's digits
 * whatever its spacing. Best matches first (name starting with the query, then by name), at most
 * `limit` rows.
 */
export async function searchCustomers(query: string, limit = 8): Promise<CustomerRow[]> {
  const words = query.toLowerCase().split(/\s+/).filter(Boolean).slice(0, 6);
  if (words.length === 0) return [];
  const em = await getEm();
  const where: string[] = [];
  const params: unknown[] = [];
  for (const word of words) {
    const digits = word.replace(/[^0-9]/g, "");
    params.push(`%${likeEscape(word)}%`);
    if (digits.length >= 3 && /^[0-9()+\-.\s]+$/.test(word)) {
      params.push(`%${digits}%`);
      where.push(`(${SEARCH_TEXT} like ? or ${PHONE_DIGITS} like ?)`);
    } else {
      where.push(`${SEARCH_TEXT} like ?`);
    }
  }
  params.push(`${likeEscape(words.join(" "))}%`, Math.min(Math.max(1, limit), 20));
  const rows = await em.getConnection().execute<
    {
      id: string;
      name: string;
      email: string;
      phone: string | null;
      company: string | null;
      user_id: string | null;
    }[]
  >(
    `select id, name, email, phone, company, user_id from customer
      where ${where.join(" and ")}
      order by (lower(name) like ?) desc, lower(name), email
      limit ?`,
    params,
  );
  return rows.map((c) => ({
    id: c.id,
    name: c.name,
    email: c.email,
    phone: c.phone,
    company: c.company,
    hasAccount: c.user_id != null,
  }));
}

/** One customer as a plain row, or null. */
export async function customerRow(id: string): Promise<CustomerRow | null> {
  const em = await getEm();
  const c = await em.findOne(Customer, { id });
  return c
    ? {
        id: c.id,
        name: c.name,
        email: c.email,
        phone: c.phone ?? null,
        company: c.company ?? null,
        hasAccount: c.user != null,
      }
    : null;
}

/** A customer the counter enters for a phone order (no sign-in of their own yet). */
export async function createPhoneCustomer(
  input: { name: string; email: string; phone?: string; company?: string; addressLines?: string },
  actorId: string,
): Promise<CustomerRow> {
  const em = await getEm();
  const email = input.email.toLowerCase();
  const taken = await em.findOne(Customer, { email });
  if (taken) {
    throw new AppError("conflict", `${taken.name} already has that e-mail: use them, or check the address.`, {
      email: `Already a customer (${taken.name}).`,
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
