import Link from "next/link";
import { BrandMark } from "@/components/brand-mark";

export default function AuthLayout({ children }: { children: React.ReactNode }) {
  return (
    <div className="flex min-h-dvh flex-col items-center bg-paper px-4 py-10">
      <Link href="/" className="mb-8 flex items-center gap-3 text-ink no-underline">
        <BrandMark className="size-10" />
        <span className="text-2xl font-bold tracking-tight">Yokeline</span>
      </Link>
      <main id="main" className="w-full max-w-md">
        {children}
      </main>
    </div>
  );
}
