import { Heading, Link } from "@react-email/components";
import { EmailLayout, heading, type EmailShop } from "./components/email-layout";
import { ActionButton, Paragraph } from "./components/parts";

export interface StaffInviteProps {
  shop: EmailShop;
  name: string;
  /** "Counter", "Floor" or "Owner". */
  roleLabel: string;
  /** What the role does, in a few words. */
  roleDuties: string;
  invitedBy: string;
  /** The one-time link to choose a password. */
  url: string;
  /** e.g. "11 December 2026" */
  expiresOn: string;
}

export const staffInviteSubject = (p: Pick<StaffInviteProps, "roleLabel">) =>
  `Your ${p.roleLabel.toLowerCase()} account is ready to set up`;

export function StaffInviteEmail(p: StaffInviteProps) {
  return (
    <EmailLayout shop={p.shop} preview={`Choose a password to start as ${p.roleLabel.toLowerCase()} staff.`}>
      <Heading as="h1" style={heading}>
        Welcome to the staff
      </Heading>
      <Paragraph>
        Hello {p.name}, {p.invitedBy} has added you to {p.shop.name}&apos;s staff as{" "}
        <strong>{p.roleLabel}</strong> ({p.roleDuties}). Choose a password to sign in.
      </Paragraph>
      <ActionButton href={p.url}>Choose my password</ActionButton>
      <Paragraph>
        Or paste this link into your browser: <Link href={p.url}>{p.url}</Link>
      </Paragraph>
      <Paragraph>
        The link works once, until {p.expiresOn}. If you did not expect this e-mail, you can ignore it.
      </Paragraph>
    </EmailLayout>
  );
}

export default StaffInviteEmail;
