import localFont from 'next/font/local';

export const sans = localFont({
  src: [
    { path: '../public/fonts/public-sans-latin-400-normal.woff2', weight: '400', style: 'normal' },
    { path: '../public/fonts/public-sans-latin-600-normal.woff2', weight: '600', style: 'normal' },
    { path: '../public/fonts/public-sans-latin-700-normal.woff2', weight: '700', style: 'normal' },
  ],
  variable: '--font-sans',
  display: 'swap',
});

export const mono = localFont({
  src: [
    { path: '../public/fonts/ibm-plex-mono-latin-400-normal.woff2', weight: '400', style: 'normal' },
    { path: '../public/fonts/ibm-plex-mono-latin-600-normal.woff2', weight: '600', style: 'normal' },
  ],
  variable: '--font-mono',
  display: 'swap',
});
