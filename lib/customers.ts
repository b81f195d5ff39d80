import "server-only";
import { Customer, User } from "@/entities";
import { getEm } from "@/lib/db/orm";
import { recordAudit } from "@/lib/audit";
import { AppError } from "@/lib/http/errors";
import { containsPattern, likeEscape } from "@/lib/tables/params";

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

/**
 * The text a customer search matches, as the trigram index `customer_search_trgm_index` has it
 * (name, e-mail, company and phone, in lower case); `c` is the table's alias with its dot, or "".
 */
export const customerSearchText = (c: string) =>
  `lower(${c}name || ' ' || ${c}email || ' ' || coalesce(${c}company, '') || ' ' || coalesce(${c}phone, ''))`;
/** The phone's digits alone (index `customer_phone_digits_trgm_index`): "555 0163" finds "(555) 016-3…". */
const phoneDigits = (c: string) => `regexp_replace(coalesce(${c}phone, ''), '[^0-9]', '', 'g')`;

/**
 * Which customers a search text finds (the counter's search and the customers table alike): every
 * word must appear somewhere in the name, e-mail, company or phone (any capitals); a word of digits
 * also matches the phone's digits whatever its spacing. SQL with `?` placeholders, served by the
 * trigram indexes; `alias` names the customer table ("c") when the query joins others. Null when
 * the text holds no word.
 */
export function customerMatch(query: string, alias = ""): { sql: string; params: string[] } | null {
  const c = alias ? `${alias}.` : "";
  const words = query.toLowerCase().split(/\s+/).filter(Boolean).slice(0, 6);
  if (words.length === 0) return null;
  const where: string[] = [];
  const params: string[] = [];
  for (const word of words) {
    const digits = word.replace(/[^0-9]/g, "");
    params.push(containsPattern(word));
    if (digits.length >= 3 && /^[0-9()+\-.\s]+$/.test(word)) {
      params.push(containsPattern(digits));
      where.push(`(${customerSearchText(c)} like ? or ${phoneDigits(c)} like ?)`);
    } else {
      where.push(`${customerSearchText(c)} like ?`);
    }
  }
  return { sql: `(${where.join(" and ")})`, params };
}

/** The counter's customer search: best matches first (name starting with the text, then by name), at most `limit`. */
export async function searchCustomers(query: string, limit = 8): Promise<CustomerRow[]> {
  const match = customerMatch(query);
  if (!match) return [];
  const em = await getEm();
  const words = query.toLowerCase().split(/\s+/).filter(Boolean);
  const params = [...match.params, `${likeEscape(words.join(" "))}%`, Math.min(Math.max(1, limit), 20)];
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
      where ${match.sql}
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
