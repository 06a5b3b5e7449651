import type { Metadata } from "next";
import type { ReactNode } from "react";
import { SiteFooter } from "@/components/SiteFooter";
import { SiteHeader } from "@/components/SiteHeader";
import { ENGINE_VERSION } from "@/lib/engine/version";
import "./globals.css";

// Every page is rendered per request, so that its scripts carry the nonce of its Content-Security-Policy (proxy.ts).
export const dynamic = "force-dynamic";

export const metadata: Metadata = {
  title: "Ozone Loss Cycles",
  description: "Which catalytic cycles destroy stratospheric ozone, how fast, and why.",
  icons: { icon: "/icon.svg" },
};

export default function RootLayout({ children }: { children: ReactNode }) {
  return (
    <html lang="en">
      <body className="min-h-screen">
        <SiteHeader />
        <main>{children}</main>
        <SiteFooter engineVersion={ENGINE_VERSION} />
      </body>
    </html>
  );
}
