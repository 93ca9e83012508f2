import type { Metadata } from "next";
import localFont from "next/font/local";
import { connection } from "next/server";
import "./globals.css";

// Shipped with the app: nothing is fetched at build or run time.
const inter = localFont({
  src: [
    { path: "./fonts/inter-latin-400-normal.woff2", weight: "400", style: "normal" },
    { path: "./fonts/inter-latin-500-normal.woff2", weight: "500", style: "normal" },
    { path: "./fonts/inter-latin-600-normal.woff2", weight: "600", style: "normal" },
    { path: "./fonts/inter-latin-700-normal.woff2", weight: "700", style: "normal" },
  ],
  variable: "--font-inter",
  display: "swap",
});

export const metadata: Metadata = {
  title: { default: "Scarpline", template: "%s · Scarpline" },
  description: "Stability checks of embankment dams and soil slopes, kept and reviewed as a team.",
};

export default async function RootLayout({ children }: { children: React.ReactNode }) {
  // Every page renders per request, so each gets the CSP nonce that proxy.ts issues for it.
  await connection();
  return (
    <html lang="en" className={inter.variable}>
      <body className="font-sans">{children}</body>
    </html>
  );
}
