import { Body, Container, Head, Hr, Html, Preview, Section, Text } from "@react-email/components";
import type { CSSProperties, ReactNode } from "react";

/** The shop as it appears in the header and footer of every e-mail. */
export interface EmailShop {
  name: string;
  /** Lines separated by newlines, as kept on the shop record. */
  addressLines: string;
  phone: string;
  email: string;
}

export const colors = {
  ink: "#1c2024",
  muted: "#5b6570",
  line: "#e3e6ea",
  paper: "#f4f5f7",
  steel: "#1f4e79",
};

export const text: CSSProperties = {
  fontSize: "15px",
  lineHeight: "22px",
  color: colors.ink,
  margin: "0 0 14px",
};
export const mutedText: CSSProperties = {
  ...text,
  color: colors.muted,
  fontSize: "13px",
  lineHeight: "19px",
};
export const heading: CSSProperties = {
  fontSize: "22px",
  lineHeight: "28px",
  fontWeight: 700,
  color: colors.ink,
  margin: "0 0 16px",
};

/** One layout for every e-mail: the shop's name on top, its address and contact at the bottom. */
export function EmailLayout({
  shop,
  preview,
  children,
}: {
  shop: EmailShop;
  preview: string;
  children: ReactNode;
}) {
  const address = shop.addressLines
    .split("\n")
    .map((l) => l.trim())
    .filter(Boolean);
  const contact = [shop.phone, shop.email].filter(Boolean).join(" · ");
  return (
    <Html lang="en">
      <Head />
      <Preview>{preview}</Preview>
      <Body
        style={{
          backgroundColor: colors.paper,
          margin: 0,
          padding: "24px 0",
          fontFamily: "Inter, Helvetica, Arial, sans-serif",
        }}
      >
        <Container
          style={{
            maxWidth: "560px",
            margin: "0 auto",
            backgroundColor: "#ffffff",
            border: `1px solid ${colors.line}`,
            borderRadius: "8px",
          }}
        >
          <Section style={{ padding: "20px 28px", borderBottom: `3px solid ${colors.steel}` }}>
            <Text style={{ margin: 0, fontSize: "18px", fontWeight: 700, color: colors.steel }}>
              {shop.name}
            </Text>
          </Section>
          <Section style={{ padding: "24px 28px 8px" }}>{children}</Section>
          <Hr style={{ borderColor: colors.line, margin: "8px 28px" }} />
          <Section style={{ padding: "4px 28px 20px" }}>
            <Text style={{ ...mutedText, margin: 0 }}>
              {shop.name}
              {address.map((line) => (
                <span key={line}>
                  <br />
                  {line}
                </span>
              ))}
              {contact && (
                <>
                  <br />
                  {contact}
                </>
              )}
            </Text>
          </Section>
        </Container>
      </Body>
    </Html>
  );
}
