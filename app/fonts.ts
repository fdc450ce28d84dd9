import localFont from 'next/font/local';

// Atkinson Hyperlegible (SIL Open Font Licence, see OFL-atkinson-hyperlegible.txt): letters
// designed to stay distinct at a distance, which suits a tablet at the saw.
export const sansFont = localFont({
  src: './fonts/atkinson-hyperlegible-next-latin-wght-normal.woff2',
  variable: '--font-kerfwise-sans',
  weight: '200 800',
  display: 'swap',
});

export const monoFont = localFont({
  src: './fonts/atkinson-hyperlegible-mono-latin-wght-normal.woff2',
  variable: '--font-kerfwise-mono',
  weight: '200 800',
  display: 'swap',
});
