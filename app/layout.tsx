import type { Metadata, Viewport } from 'next';
import type { ReactNode } from 'react';
import { mono, sans } from './fonts';
import './globals.css';

export const metadata: Metadata = {
  title: { default: 'Plumbline', template: '%s · Plumbline' },
  description: 'Fall time, impact energy and drift of dropped objects, for planning work at height.',
};

export const viewport: Viewport = { width: 'device-width', initialScale: 1, themeColor: '#f6f4ef' };

export default function RootLayout({ children }: { children: ReactNode }) {
  return (
    <html lang="en-GB" className={`${sans.variable} ${mono.variable}`}>
      <body className="min-h-screen">{children}</body>
    </html>
  );
}
