import { Account } from "./account.entity";
import { AuditEvent } from "./audit-event.entity";
import { Customer } from "./customer.entity";
import { Design } from "./design.entity";
import { EmailMessage } from "./email-message.entity";
import { Order } from "./order.entity";
import { OrderEvent } from "./order-event.entity";
import { OrderNote } from "./order-note.entity";
import { OrderShaft } from "./order-shaft.entity";
import { Payment } from "./payment.entity";
import { RateLimit } from "./rate-limit.entity";
import { Refund } from "./refund.entity";
import { Session } from "./session.entity";
import { Shop } from "./shop.entity";
import { SignInFailure } from "./sign-in-failure.entity";
import { ShopConfig } from "./shop-config.entity";
import { ShopConfigVersion } from "./shop-config-version.entity";
import { Upload } from "./upload.entity";
import { User } from "./user.entity";
import { Verification } from "./verification.entity";
import { WebhookEvent } from "./webhook-event.entity";
import { WorkOrder } from "./work-order.entity";
import { WorkOrderStep } from "./work-order-step.entity";
import { StepRecord } from "./step-record.entity";
import { StaffInvitation } from "./staff-invitation.entity";

export {
  Account,
  AuditEvent,
  Customer,
  Design,
  EmailMessage,
  Order,
  OrderEvent,
  OrderNote,
  OrderShaft,
  Payment,
  RateLimit,
  Refund,
  Session,
  Shop,
  ShopConfig,
  ShopConfigVersion,
  SignInFailure,
  Upload,
  User,
  Verification,
  WebhookEvent,
  WorkOrder,
  WorkOrderStep,
  StepRecord,
  StaffInvitation,
};
export type { WarningAcknowledgement, FailedCheckAcceptance } from "./order-shaft.entity";

/** Every entity, for the ORM configuration. */
export const entities = [
  User,
  Session,
  Account,
  Verification,
  RateLimit,
  SignInFailure,
  Shop,
  ShopConfig,
  ShopConfigVersion,
  Customer,
  AuditEvent,
  Design,
  Order,
  OrderShaft,
  Payment,
  Refund,
  WebhookEvent,
  OrderEvent,
  OrderNote,
  EmailMessage,
  Upload,
  WorkOrder,
  WorkOrderStep,
  StepRecord,
  StaffInvitation,
];
