import type { Metadata, Viewport } from 'next';
import { SkipLink } from '@/components/layout/skip-link';
import { Providers } from '@/components/providers';
import { monoFont, sansFont } from './fonts';
import './globals.css';

export const metadata: Metadata = {
  title: { default: 'Kerfwise', template: '%s · Kerfwise' },
  description: 'Cutting plans, saw guidance and offcut stock for timber yards.',
};

export const viewport: Viewport = { themeColor: '#1d5545' };

// Every page reads the yard's own data per request; none is rendered at build time, so
// `next build` never opens (or locks) the data folder.
export const dynamic = 'force-dynamic';

export default function RootLayout({ children }: { children: React.ReactNode }) {
  return (
    <html lang="en-GB" className={`${sansFont.variable} ${monoFont.variable}`}>
      <body className="min-h-screen">
        <SkipLink />
        <Providers>{children}</Providers>
      </body>
    </html>
  );
}
