/**
 * Test card behaviour, following Stripe's documented test numbers.
 * https://docs.stripe.com/testing#cards
 * The codes (card_declined, insufficient_funds, invalid_number, …) are the API's own, since the SDK
 * and the app read them; the messages people read are this fake's own words.
 */
export interface CardInput {
  number: string;
  expiry?: string;
  cvc?: string;
}

export type CardOutcome =
  | { kind: "success"; brand: string; last4: string; expMonth: number; expYear: number }
  | {
      kind: "declined";
      code: "card_declined";
      declineCode: string;
      message: string;
      brand: string;
      last4: string;
    }
  | { kind: "invalid"; field: "number" | "expiry" | "cvc"; code: string; message: string };

interface TestCard {
  brand: string;
  result: "success" | { declineCode: string; message: string };
}

export const TEST_CARDS: Readonly<Record<string, TestCard>> = {
  "4242424242424242": { brand: "visa", result: "success" },
  "5555555555554444": { brand: "mastercard", result: "success" },
  "4000000000000002": {
    brand: "visa",
    result: { declineCode: "generic_decline", message: "The bank turned this card down." },
  },
  "4000000000009995": {
    brand: "visa",
    result: {
      declineCode: "insufficient_funds",
      message: "The bank turned this card down: there is not enough money on it.",
    },
  },
};

function luhnValid(digits: string): boolean {
  let sum = 0;
  for (let i = 0; i < digits.length; i++) {
    let d = Number(digits[digits.length - 1 - i]);
    if (i % 2 === 1) {
      d *= 2;
      if (d > 9) d -= 9;
    }
    sum += d;
  }
  return sum % 10 === 0;
}

function parseExpiry(raw: string, now: Date): { month: number; year: number } | "incomplete" | "past" {
  const m = /^\s*(\d{1,2})\s*\/?\s*(\d{2}|\d{4})\s*$/.exec(raw);
  if (!m) return "incomplete";
  const month = Number(m[1]);
  let year = Number(m[2]);
  if (year < 100) year += 2000;
  if (month < 1 || month > 12) return "incomplete";
  const current = now.getUTCFullYear() * 12 + now.getUTCMonth();
  if (year * 12 + (month - 1) < current) return "past";
  return { month, year };
}

export function evaluateCard(input: CardInput, now = new Date()): CardOutcome {
  const number = input.number.replace(/[\s-]/g, "");
  if (!/^\d{12,19}$/.test(number) || !luhnValid(number)) {
    return {
      kind: "invalid",
      field: "number",
      code: "invalid_number",
      message: "That is not a valid card number. Check the digits.",
    };
  }
  const card = TEST_CARDS[number];
  if (!card) {
    return {
      kind: "invalid",
      field: "number",
      code: "card_declined",
      message: "This local test page takes test cards only, such as 4242 4242 4242 4242.",
    };
  }
  const expiry = parseExpiry(input.expiry ?? "", now);
  if (expiry === "incomplete") {
    return {
      kind: "invalid",
      field: "expiry",
      code: "invalid_expiry",
      message: "Enter the card's expiry as month and year (MM/YY).",
    };
  }
  if (expiry === "past") {
    return {
      kind: "invalid",
      field: "expiry",
      code: "invalid_expiry_year",
      message: "This card's expiry date has passed.",
    };
  }
  if (!/^\d{3,4}$/.test((input.cvc ?? "").trim())) {
    return {
      kind: "invalid",
      field: "cvc",
      code: "incomplete_cvc",
      message: "Enter the 3 or 4 digit security code from the card.",
    };
  }
  const last4 = number.slice(-4);
  if (card.result === "success") {
    return { kind: "success", brand: card.brand, last4, expMonth: expiry.month, expYear: expiry.year };
  }
  return {
    kind: "declined",
    code: "card_declined",
    declineCode: card.result.declineCode,
    message: card.result.message,
    brand: card.brand,
    last4,
  };
}
