import Link from "next/link";
import { redirect } from "next/navigation";
import { Gauge, Ruler, ShieldCheck, Truck } from "lucide-react";
import { getCurrentUser } from "@/lib/auth/guard";
import { ROLE_HOME } from "@/lib/auth/permissions";
import { getShop } from "@/lib/shop/shop";
import { BrandMark } from "@/components/brand-mark";
import { SiteFooter } from "@/components/site-footer";

/** The shop's front page; a signed-in user goes straight to their role's home. */
export default async function HomePage() {
  const [user, shop] = await Promise.all([getCurrentUser(), getShop()]);
  if (user) redirect(ROLE_HOME[user.role]);
  const points = [
    {
      Icon: Ruler,
      title: "Measure",
      text: "Length between joint centres and three angles, with a guide beside every field.",
    },
    {
      Icon: Gauge,
      title: "Engineered live",
      text: "Tube, critical speed, torsion, working angles and phasing, checked as you type.",
    },
    {
      Icon: ShieldCheck,
      title: "Built and checked",
      text: "Cut, welded and phased, balanced and inspected against the design's tolerances.",
    },
    {
      Icon: Truck,
      title: "Followed to your door",
      text: "See each step in the shop, then pickup or shipping.",
    },
  ];
  return (
    <div className="flex min-h-dvh flex-col">
      <header className="bg-ink text-white">
        <div className="mx-auto flex max-w-6xl items-center gap-3 px-4 py-4">
          <BrandMark className="size-9 shrink-0" />
          <span className="text-lg font-bold">Yokeline</span>
          <span className="hidden text-sm text-steel-100 sm:inline">for {shop.name}</span>
          <nav aria-label="Account" className="ml-auto flex gap-2">
            <Link
              href="/sign-in"
              className="btn border border-steel-500 whitespace-nowrap text-white no-underline hover:bg-steel-700"
            >
              Sign in
            </Link>
            <Link href="/sign-up" className="btn-accent whitespace-nowrap no-underline">
              Create account
            </Link>
          </nav>
        </div>
      </header>
      <main id="main" className="mx-auto w-full max-w-6xl flex-1 px-4 py-12">
        <h1 className="max-w-3xl text-4xl font-bold md:text-5xl">
          A driveshaft built for your vehicle, engineered before it is cut.
        </h1>
        <p className="mt-4 max-w-2xl text-lg text-ink-muted">
          {shop.name} builds one-off propeller shafts for trucks, hot rods, off-road rigs, farm and industrial
          machines. Enter your measurements, see whether the shaft is safe and what it costs, pay, and follow
          it through the shop.
        </p>
        <div className="mt-6 flex flex-wrap gap-3">
          <Link href="/build" className="btn-accent px-5 py-2.5 text-base no-underline">
            Design your shaft
          </Link>
          <Link href="/sign-in" className="btn-quiet px-5 py-2.5 text-base no-underline">
            Follow an order
          </Link>
        </div>
        <ul className="mt-10 grid gap-4 sm:grid-cols-2 lg:grid-cols-4">
          {points.map(({ Icon, title, text }) => (
            <li key={title} className="card p-5">
              <Icon className="size-6 text-brass-500" aria-hidden="true" />
              <h2 className="mt-3 font-semibold">{title}</h2>
              <p className="mt-1 text-sm text-ink-muted">{text}</p>
            </li>
          ))}
        </ul>
        <p className="mt-10 text-sm text-ink-muted">
          {shop.addressLines.split("\n").join(" · ")}{" "}
          {shop.phone && (
            <>
              · <span className="whitespace-nowrap">{shop.phone}</span>
            </>
          )}
        </p>
      </main>
      <SiteFooter />
    </div>
  );
}
