import { Heading, Link } from "@react-email/components";
import { EmailLayout, heading, type EmailShop } from "./components/email-layout";
import { ActionButton, Paragraph } from "./components/parts";

export interface VerifyEmailProps {
  shop: EmailShop;
  name: string;
  /** The one-time link that proves the address and signs the account in. */
  url: string;
}

export const verifyEmailSubject = (p: Pick<VerifyEmailProps, "name">) =>
  `Confirm your e-mail address${p.name ? `, ${p.name}` : ""}`;

export function VerifyEmail(p: VerifyEmailProps) {
  return (
    <EmailLayout shop={p.shop} preview="Confirm your e-mail address to finish creating your account.">
      <Heading as="h1" style={heading}>
        Confirm your e-mail address
      </Heading>
      <Paragraph>
        Hello {p.name}, someone (we hope you) created an account at {p.shop.name} with this address. Open the
        link below to confirm it; your orders with the shop then appear in your account.
      </Paragraph>
      <ActionButton href={p.url}>Confirm my address</ActionButton>
      <Paragraph>
        Or paste this link into your browser: <Link href={p.url}>{p.url}</Link>
      </Paragraph>
      <Paragraph>The link works for one hour. If you did not sign up, ignore this e-mail.</Paragraph>
    </EmailLayout>
  );
}

export default VerifyEmail;
