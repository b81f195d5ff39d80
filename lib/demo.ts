/** The invented demo shop's accounts (demo data only; shown on the sign-in page in demo mode). */
export const DEMO_PASSWORD = "yokeline-demo-2026";

export const DEMO_STAFF = [
  { role: "owner", name: "Marta Okafor", email: "owner@tallgrass.example" },
  { role: "counter", name: "Dev Lindqvist", email: "counter@tallgrass.example" },
  { role: "floor", name: "Sam Ferreira", email: "floor@tallgrass.example" },
] as const;

export const DEMO_CUSTOMERS = [
  {
    name: "Rosa Castellanos",
    email: "rosa@customer.example",
    company: "Castellanos Hauling",
    phone: "555-0141",
  },
  { name: "Wendell Ames", email: "wendell@customer.example", company: null, phone: "555-0178" },
  {
    name: "Priya Natarajan",
    email: "priya@customer.example",
    company: "Prairie Fab & Off-Road",
    phone: "555-0115",
  },
] as const;

/** Customers the counter knows only by phone (no sign-in). */
export const DEMO_PHONE_CUSTOMERS = [
  { name: "Harlan Voss", email: "harlan.voss@farm.example", company: "Voss Family Farms", phone: "555-0190" },
] as const;

export function demoAccounts() {
  return [
    ...DEMO_STAFF.map((s) => ({
      role: s.role[0]!.toUpperCase() + s.role.slice(1),
      email: s.email,
      password: DEMO_PASSWORD,
    })),
    { role: "Customer", email: DEMO_CUSTOMERS[0].email, password: DEMO_PASSWORD },
  ];
}
