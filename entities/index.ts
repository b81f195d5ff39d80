import { Account } from "./account.entity";
import { AuditEvent } from "./audit-event.entity";
import { Customer } from "./customer.entity";
import { RateLimit } from "./rate-limit.entity";
import { Session } from "./session.entity";
import { Shop } from "./shop.entity";
import { User } from "./user.entity";
import { Verification } from "./verification.entity";

export { Account, AuditEvent, Customer, RateLimit, Session, Shop, User, Verification };

/** Every entity, for the ORM configuration. */
export const entities = [User, Session, Account, Verification, RateLimit, Shop, Customer, AuditEvent];
