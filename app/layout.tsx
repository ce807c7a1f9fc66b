import type { Metadata } from "next";
import "@fontsource/fira-sans/400.css";
import "@fontsource/fira-sans/500.css";
import "@fontsource/fira-sans/700.css";
import "./globals.css";

export const metadata: Metadata = {
  title: "Comova",
  description: "Cosmological distances, times and volumes for whole survey catalogs, reproducibly.",
};

export default function RootLayout({ children }: { children: React.ReactNode }) {
  return (
    <html lang="en">
      <body>{children}</body>
    </html>
  );
}
