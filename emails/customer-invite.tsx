import { Heading, Link } from "@react-email/components";
import { EmailLayout, heading, type EmailShop } from "./components/email-layout";
import { ActionButton, Paragraph } from "./components/parts";

export interface CustomerInviteProps {
  shop: EmailShop;
  customerName: string;
  /** The one-time sign-up link for this customer's address. */
  url: string;
}

export const customerInviteSubject = (p: Pick<CustomerInviteProps, "customerName">) =>
  `${p.customerName}, follow your orders online`;

export function CustomerInviteEmail(p: CustomerInviteProps) {
  return (
    <EmailLayout shop={p.shop} preview="Create your account to follow your orders online.">
      <Heading as="h1" style={heading}>
        Follow your orders online
      </Heading>
      <Paragraph>
        Hello {p.customerName}, the counter at {p.shop.name} has invited you to an account of your own: see
        your orders, their progress and what is left to pay, and design shafts yourself.
      </Paragraph>
      <ActionButton href={p.url}>Create my account</ActionButton>
      <Paragraph>
        Or paste this link into your browser: <Link href={p.url}>{p.url}</Link>
      </Paragraph>
      <Paragraph>The link works for seven days and only once.</Paragraph>
    </EmailLayout>
  );
}

export default CustomerInviteEmail;
