import type { Metadata } from "next";
import type { ReactNode } from "react";
import { PageChrome } from "@/components/export/PageChrome";
import { SiteHeader } from "@/components/layout/SiteHeader";
import { currentUser } from "@/lib/session";
import { mono, sans, serif } from "./fonts";
import { Providers } from "./providers";
import "./globals.css";

export const metadata: Metadata = {
  title: { default: "Branchline", template: "%s · Branchline" },
  description: "How much which-path information a superposed body's own fields leak, in flat spacetime and outside horizons.",
};

export default async function RootLayout({ children }: { children: ReactNode }) {
  const user = await currentUser();
  return (
    <html lang="en" className={`${sans.variable} ${serif.variable} ${mono.variable}`}>
      <body className="min-h-screen bg-paper text-ink antialiased">
        <Providers>
          <PageChrome header={<SiteHeader user={user ? { name: user.name, email: user.email, siteRole: user.siteRole } : null} />}>{children}</PageChrome>
        </Providers>
      </body>
    </html>
  );
}
