import { Button, Column, Link, Row, Section, Text } from "@react-email/components";
import { colors, mutedText, text } from "./email-layout";

/** One line of an order as an e-mail shows it; amounts are already formatted (e.g. "$412.00"). */
export interface EmailLine {
  description: string;
  /** A second, smaller line, e.g. "1350 mm · YL-X41 joints". */
  detail?: string;
  amount: string;
}

/** A label/amount pair under the lines, e.g. { label: "Total", amount: "$980.00" }. */
export interface EmailTotal {
  label: string;
  amount: string;
  strong?: boolean;
}

const cell = {
  fontSize: "14px",
  lineHeight: "20px",
  color: colors.ink,
  padding: "8px 0",
  borderBottom: `1px solid ${colors.line}`,
};

export function LineItems({ lines, totals = [] }: { lines: EmailLine[]; totals?: EmailTotal[] }) {
  return (
    <Section style={{ margin: "4px 0 18px" }}>
      {lines.map((line, i) => (
        <Row key={i}>
          <Column style={cell}>
            {line.description}
            {line.detail && (
              <>
                <br />
                <span style={{ color: colors.muted, fontSize: "12px" }}>{line.detail}</span>
              </>
            )}
          </Column>
          <Column style={{ ...cell, textAlign: "right", whiteSpace: "nowrap", verticalAlign: "top" }}>
            {line.amount}
          </Column>
        </Row>
      ))}
      {totals.map((t) => (
        <Row key={t.label}>
          <Column
            style={{ ...cell, borderBottom: "none", padding: "4px 0", fontWeight: t.strong ? 700 : 400 }}
          >
            {t.label}
          </Column>
          <Column
            style={{
              ...cell,
              borderBottom: "none",
              padding: "4px 0",
              textAlign: "right",
              fontWeight: t.strong ? 700 : 400,
            }}
          >
            {t.amount}
          </Column>
        </Row>
      ))}
    </Section>
  );
}

/** Key facts as a two-column list (order number, promised date, …). */
export function Facts({ facts }: { facts: Array<[label: string, value: string]> }) {
  return (
    <Section
      style={{ margin: "0 0 18px", backgroundColor: colors.paper, borderRadius: "6px", padding: "12px 16px" }}
    >
      {facts.map(([label, value]) => (
        <Row key={label}>
          <Column style={{ fontSize: "13px", color: colors.muted, padding: "3px 0", width: "45%" }}>
            {label}
          </Column>
          <Column style={{ fontSize: "14px", color: colors.ink, padding: "3px 0", fontWeight: 600 }}>
            {value}
          </Column>
        </Row>
      ))}
    </Section>
  );
}

export function ActionButton({ href, children }: { href: string; children: React.ReactNode }) {
  return (
    <Section style={{ margin: "6px 0 20px" }}>
      <Button
        href={href}
        style={{
          backgroundColor: colors.steel,
          color: "#ffffff",
          fontSize: "15px",
          fontWeight: 600,
          borderRadius: "6px",
          padding: "12px 22px",
          textDecoration: "none",
        }}
      >
        {children}
      </Button>
    </Section>
  );
}

export function Paragraph({ children }: { children: React.ReactNode }) {
  return <Text style={text}>{children}</Text>;
}

/**
 * What a payment e-mail asks: the button to the hosted payment page, the order's money and
 * promised date, its lines, and both links written out for a mail client without buttons.
 */
export function PaymentRequest(p: {
  payUrl: string;
  orderUrl: string;
  /** What is asked now, with its name ("Balance due", "Deposit"…). */
  due: { label: string; amount: string };
  total: string;
  paidSoFar: string;
  promisedDate: string;
  lines: EmailLine[];
}) {
  return (
    <>
      <ActionButton href={p.payUrl}>{`Pay ${p.due.amount}`}</ActionButton>
      <Facts
        facts={[
          ["Order total", p.total],
          ["Paid so far", p.paidSoFar],
          [p.due.label, p.due.amount],
          ["Promised for", p.promisedDate],
        ]}
      />
      <LineItems lines={p.lines} />
      <Paragraph>
        <span style={mutedText}>
          If the button does not work, open <Link href={p.payUrl}>{p.payUrl}</Link>. Your order:{" "}
          <Link href={p.orderUrl}>{p.orderUrl}</Link>
        </span>
      </Paragraph>
    </>
  );
}
