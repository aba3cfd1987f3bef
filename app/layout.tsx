import type { Metadata, Viewport } from 'next';
import type { ReactNode } from 'react';
import { ZodJitless } from '@/components/layout/zod-jitless';
import { cspNonce } from '@/lib/http/request-meta';
import { mono, sans } from './fonts';
import './globals.css';

export const metadata: Metadata = {
  title: { default: 'Plumbline', template: '%s · Plumbline' },
  description: 'Fall time, impact energy and drift of dropped objects, for planning work at height.',
};

export const viewport: Viewport = { width: 'device-width', initialScale: 1, themeColor: '#f6f4ef' };

/**
 * plotly.js-dist-min (4.1.2) creates two style elements when it loads or first draws, unless elements with these
 * ids exist: its own rules, which it adds with insertRule, and the stylesheet of the map library it bundles (we draw
 * no maps). Created ones carry no nonce and the policy refuses them, so every page brings its own, nonced.
 */
const PLOT_STYLE_IDS = ['plotly.js-style-global', 'ce8d464691048653ffe3a57c6c18ab566e8366f186677868cf724621a857b4fe'];

// Reading the request's nonce renders every page per request, which nonced scripts need (a prerendered page's
// scripts would carry no nonce and the policy would block them).
export default async function RootLayout({ children }: { children: ReactNode }) {
  const nonce = await cspNonce();
  return (
    <html lang="en-GB" className={`${sans.variable} ${mono.variable}`}>
      <head>
        {PLOT_STYLE_IDS.map((id) => (
          <style key={id} id={id} nonce={nonce} />
        ))}
      </head>
      <body className="min-h-screen">
        <ZodJitless />
        {children}
      </body>
    </html>
  );
}
