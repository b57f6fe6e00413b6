import localFont from 'next/font/local';

// Shipped in the repository (app/fonts, SIL OFL 1.1): nothing is fetched at build or run time.
export const notoSans = localFont({
  src: [
    { path: './fonts/NotoSans-Regular.ttf', weight: '400', style: 'normal' },
    { path: './fonts/NotoSans-Italic.ttf', weight: '400', style: 'italic' },
    { path: './fonts/NotoSans-Bold.ttf', weight: '700', style: 'normal' },
  ],
  variable: '--font-noto',
  display: 'swap',
});

export const notoSyllabics = localFont({
  src: [
    { path: './fonts/NotoSansCanadianAboriginal-Regular.ttf', weight: '400', style: 'normal' },
    { path: './fonts/NotoSansCanadianAboriginal-Bold.ttf', weight: '700', style: 'normal' },
  ],
  variable: '--font-noto-syllabics',
  display: 'swap',
  preload: false,
});
