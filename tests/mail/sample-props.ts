import type { TemplateName, TemplateProps } from "@/lib/mail";

const lines = [
  {
    description: "Rear driveshaft, YL-X41 joints",
    detail: "1,382 mm · 3.5 in × 0.083 in DOM tube",
    amount: "$612.00",
  },
  { description: "Balancing to 4,500 rpm", amount: "$45.00" },
];

/** One valid set of props per template, for the tests. */
export const SAMPLE_PROPS: { [N in TemplateName]: TemplateProps[N] } = {
  "order-received": {
    orderNumber: "Y26-0042",
    customerName: "Marisol Ortiz",
    lines,
    subtotal: "$657.00",
    tax: "$52.56",
    shipping: "$0.00",
    total: "$709.56",
    paid: "$354.78",
    promisedDate: "Thursday 24 December 2026",
    fulfilment: "pickup",
    orderUrl: "http://127.0.0.1:3000/orders/Y26-0042",
  },
  "payment-receipt": {
    orderNumber: "Y26-0042",
    customerName: "Marisol Ortiz",
    paymentLabel: "Deposit",
    amountPaid: "$354.78",
    paidOn: "2 December 2026",
    totalPaid: "$354.78",
    balanceRemaining: "$354.78",
    lines,
    total: "$709.56",
    orderUrl: "http://127.0.0.1:3000/orders/Y26-0042",
  },
  "balance-due": {
    orderNumber: "Y26-0042",
    customerName: "Marisol Ortiz",
    balanceDue: "$354.78",
    total: "$709.56",
    paidSoFar: "$354.78",
    payUrl: "http://127.0.0.1:12111/checkout/cs_test_balance",
    promisedDate: "Thursday 24 December 2026",
    lines,
    orderUrl: "http://127.0.0.1:3000/orders/Y26-0042",
  },
  "shaft-ready": {
    orderNumber: "Y26-0042",
    customerName: "Marisol Ortiz",
    fulfilment: "pickup",
    lines: lines.map((l) => ({ ...l, amount: "" })),
    balanceDue: "$354.78",
    payUrl: "http://127.0.0.1:12111/checkout/cs_test_balance",
    orderUrl: "http://127.0.0.1:3000/orders/Y26-0042",
  },
  "shaft-shipped": {
    orderNumber: "Y26-0042",
    customerName: "Marisol Ortiz",
    carrier: "UPS Ground",
    trackingNumber: "1Z999AA10123456784",
    trackingUrl: "https://www.ups.com/track?tracknum=1Z999AA10123456784",
    shipTo: "Marisol Ortiz\n12 Mill Road\nSpringfield",
    shippedOn: "20 December 2026",
    lines: lines.map((l) => ({ ...l, amount: "" })),
    orderUrl: "http://127.0.0.1:3000/orders/Y26-0042",
  },
  "verify-email": {
    name: "Marisol Ortiz",
    url: "http://127.0.0.1:3000/api/auth/verify-email?token=sample&callbackURL=%2Forders",
  },
  "customer-invite": {
    customerName: "Marisol Ortiz",
    url: "http://127.0.0.1:3000/sign-up?invite=sample",
  },
  "staff-invite": {
    name: "Marisol Ortiz",
    roleLabel: "Floor",
    roleDuties: "scans travellers and records measurements",
    invitedBy: "Dana Whitlock",
    url: "http://127.0.0.1:3000/set-password?token=sample",
    expiresOn: "11 December 2026",
  },
};
