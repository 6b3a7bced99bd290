import type { Metadata, Viewport } from "next";
import localFont from "next/font/local";
import type { ReactNode } from "react";
import { Header } from "@/components/shell/Header";
import { sessionUser } from "@/lib/server/viewer";
import "./globals.css";

const inter = localFont({ src: "../public/fonts/InterVariable-latin.woff2", variable: "--font-inter", display: "swap", weight: "100 900" });

export const metadata: Metadata = {
  title: { default: "Benchwright: plan a garage woodshop that fits", template: "%s · Benchwright" },
  description: "Lay out shop cabinets, a flush miter-saw station and clear paths in a measured garage, then get the parts, sheet maps and shopping list.",
};
export const viewport: Viewport = { width: "device-width", initialScale: 1, themeColor: "#4b3423" };

export default async function RootLayout({ children }: { children: ReactNode }) {
  const user = await sessionUser();
  return (
    <html lang="en" className={inter.variable}>
      <body className="min-h-screen font-sans antialiased">
        <a href="#main" className="sr-only focus:not-sr-only focus:absolute focus:left-2 focus:top-2 focus:z-50 focus:rounded focus:bg-paper focus:p-2">Skip to content</a>
        <Header user={user ? { name: user.name, role: user.role } : null} />
        <main id="main">{children}</main>
      </body>
    </html>
  );
}
