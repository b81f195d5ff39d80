import "server-only";
import { Order, OrderNote, User } from "@/entities";
import type { NoteVisibility } from "./states";
import type { OrderNoteView } from "./views";
import type { CurrentUser } from "@/lib/auth/guard";
import { can } from "@/lib/auth/permissions";
import { recordAudit } from "@/lib/audit";
import { inTransaction } from "@/lib/db/orm";
import { AppError } from "@/lib/http/errors";

/** A note as the screens show it. */
export type { OrderNoteView };

/**
 * The notes a user may read: staff see every note; anyone else (the customer) only the ones
 * written for the customer. Staff-only notes never leave the server for a customer.
 */
export function notesFor(notes: readonly OrderNote[], staff: boolean): OrderNoteView[] {
  return notes
    .filter((n) => staff || n.visibility === "customer")
    .map((n) => ({
      id: n.id,
      body: n.body,
      visibility: n.visibility,
      byName: n.authorName,
      at: n.createdAt.toISOString(),
    }));
}

/** Counter or owner adds a note to an order (who and when kept; audited). */
export async function addOrderNote(
  user: CurrentUser,
  input: { orderId: string; body: string; visibility: NoteVisibility },
): Promise<OrderNoteView> {
  if (!can(user.role, "orders.desk"))
    throw new AppError("forbidden", "Only the counter or an owner can add notes to an order.");
  return inTransaction(async (em) => {
    const order = await em.findOne(Order, { id: input.orderId });
    if (!order) throw new AppError("not_found", "No such order.");
    const author = await em.findOneOrFail(User, { id: user.id });
    const note = em.create(OrderNote, {
      order,
      visibility: input.visibility,
      body: input.body.trim(),
      author,
      authorName: author.name,
      createdAt: new Date(),
    });
    await recordAudit(
      {
        actorId: user.id,
        action: "order.note",
        subjectType: "order",
        subjectId: order.id,
        details: { noteId: note.id, visibility: note.visibility },
      },
      em,
    );
    return notesFor([note], true)[0]!;
  });
}
