import type { Metadata, Viewport } from "next";
import localFont from "next/font/local";
import "./globals.css";

const sans = localFont({
  src: "./fonts/inter-var.woff2",
  variable: "--font-sans",
  display: "swap",
  weight: "100 900",
});
const mono = localFont({
  src: "./fonts/jetbrains-mono-var.woff2",
  variable: "--font-mono",
  display: "swap",
  weight: "100 800",
});

export const metadata: Metadata = {
  title: { default: "Yokeline", template: "%s · Yokeline" },
  description: "Custom driveshafts, engineered, ordered and built.",
  icons: { icon: "/yokeline-mark.svg" },
};

// Every screen depends on who is signed in and on live shop data: render per request.
export const dynamic = "force-dynamic";

export const viewport: Viewport = { themeColor: "#1b2430" };

export default function RootLayout({ children }: { children: React.ReactNode }) {
  return (
    <html lang="en" className={`${sans.variable} ${mono.variable}`}>
      <body>{children}</body>
    </html>
  );
}
