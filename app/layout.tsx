import "@fontsource/barlow/400.css";
import "@fontsource/barlow/500.css";
import "@fontsource/barlow/600.css";
import "@fontsource/barlow/700.css";
import "./globals.css";
import type { Metadata, Viewport } from "next";
import type { ReactNode } from "react";
import { SiteFooter } from "@/components/site-footer";
import { SiteHeader } from "@/components/site-header";
import { SiteMain } from "@/components/site-main";
import { getSessionUser } from "@/lib/auth/get-session-user";
import { getShownName } from "@/lib/auth/get-shown-name";
import { Providers } from "./providers";
import { signOutAction } from "./sign-out-action";

export const metadata: Metadata = {
  title: { default: "Plumbline", template: "%s · Plumbline" },
  description: "Scrutineering, classing and run groups for club time-attack days.",
  applicationName: "Plumbline",
  manifest: "/manifest.webmanifest",
  icons: { icon: "/icons/icon-192.png", apple: "/icons/apple-touch-icon.png" },
};

export const viewport: Viewport = { themeColor: "#101214", width: "device-width", initialScale: 1 };

export default async function RootLayout({ children }: { children: ReactNode }) {
  const user = await getSessionUser();
  const shownName = user ? await getShownName(user) : null;
  return (
    <html lang="en-GB">
      <body className="flex min-h-dvh flex-col">
        <SiteHeader userName={shownName} signOutAction={signOutAction} />
        <SiteMain>
          <Providers>{children}</Providers>
        </SiteMain>
        <SiteFooter />
      </body>
    </html>
  );
}
