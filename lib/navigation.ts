import type { Role } from "@/lib/auth/roles";

export interface NavItem {
  href: string;
  label: string;
}

/** Each role's main navigation; the server decides access, this only decides what is shown. */
export const NAVIGATION: Record<Role, NavItem[]> = {
  customer: [
    { href: "/orders", label: "My orders" },
    { href: "/build", label: "Design a shaft" },
  ],
  counter: [
    { href: "/desk", label: "Order desk" },
    { href: "/desk/new", label: "New phone order" },
    { href: "/desk/orders", label: "Orders" },
    { href: "/desk/customers", label: "Customers" },
    { href: "/floor/queue", label: "Work queue" },
  ],
  floor: [
    { href: "/floor", label: "Scan station" },
    { href: "/floor/queue", label: "Work queue" },
  ],
  owner: [
    { href: "/overview", label: "Overview" },
    { href: "/desk", label: "Order desk" },
    { href: "/desk/orders", label: "Orders" },
    { href: "/floor", label: "Floor" },
    { href: "/overview/shafts", label: "Shafts" },
    { href: "/overview/catalogue", label: "Catalogue & prices" },
    { href: "/overview/staff", label: "Staff" },
  ],
};

export const ROLE_LABEL: Record<Role, string> = {
  customer: "Customer",
  counter: "Counter",
  floor: "Floor",
  owner: "Owner",
};

/** The links a role sees; the demo shop's owner also gets the page of sent e-mails. */
export function navigationFor(role: Role, demo: boolean): NavItem[] {
  const items = NAVIGATION[role];
  return demo && role === "owner" ? [...items, { href: "/overview/mail", label: "Sent mail" }] : items;
}
