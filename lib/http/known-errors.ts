import "server-only";
import { ConnectionException, NotFoundError } from "@mikro-orm/core";
import { z } from "zod";
import { AppError } from "./errors";

/** The message callers see while the database cannot be reached. */
export const DATABASE_DOWN_MESSAGE = "The database is not reachable just now; try again in a moment.";

/**
 * node-postgres's words for a connection lost under a query (these carry no SQLSTATE): the server
 * went away mid-statement, or a pooled client broke and was handed back. Knex's "Transaction query
 * already complete" is the same fault seen one step later: the connection died, knex ended the
 * transaction, and the next statement of that unit of work found it gone (nothing was committed).
 * "Timeout acquiring a connection" is knex's pool giving up while the server cannot be reached.
 */
const CONNECTION_LOST =
  /Connection terminated|connection error and is not queryable|Client was closed and is not queryable|Connection ended unexpectedly|timeout exceeded when trying to connect|Transaction query already complete|Timeout acquiring a connection/i;

/** Node socket errors and PostgreSQL shutdown/start-up states (57P01–57P03). */
const DOWN_CODES = new Set(["ECONNREFUSED", "ECONNRESET", "ETIMEDOUT", "EPIPE", "57P01", "57P02", "57P03"]);

const uuidSchema = z.uuid();

/** Whether `value` is a well-formed UUID (what every id in Yokeline is). */
export function isUuid(value: unknown): value is string {
  return uuidSchema.safeParse(value).success;
}

/**
 * Errors that come from a request the caller got wrong, not from a fault of ours, as the AppError
 * they should be answered with: a record that is not there (MikroORM's findOneOrFail) or an id
 * PostgreSQL cannot read (22P02) is not_found; a number out of a column's range (22003) or text it
 * cannot take (a NUL: 22021, 08P01) invalid;
 * a unique index's refusal (23505) conflict.
 * A database that went away after a good start (refused connection, server shut down or starting,
 * SQLSTATE class 08) is unavailable (503), so the caller is told to try again.
 */
export function knownError(error: unknown): AppError | null {
  if (error instanceof NotFoundError) return new AppError("not_found", "No such record.");
  const code = typeof error === "object" && error !== null ? (error as { code?: unknown }).code : undefined;
  if (code === "22P02") return new AppError("not_found", "No such record.");
  if (code === "22003") return new AppError("invalid", "A number is out of range.");
  // Text PostgreSQL cannot take (a NUL character: 22021 in a statement's value, or 08P01 when the
  // driver cannot even frame it): the caller's input, not a lost connection, whatever its class.
  if (code === "22021" || code === "08P01")
    return new AppError("invalid", "The request holds a character the shop cannot store (NUL).");
  // A pre-check can lose a race; the database's unique index still says no (e.g. a customer e-mail).
  if (code === "23505") return new AppError("conflict", "That already exists.");
  const message = error instanceof Error ? error.message : "";
  if (
    error instanceof ConnectionException ||
    (typeof code === "string" && (DOWN_CODES.has(code) || code.startsWith("08"))) ||
    CONNECTION_LOST.test(message)
  )
    return new AppError("unavailable", DATABASE_DOWN_MESSAGE);
  return null;
}
