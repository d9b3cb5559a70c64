import { createRequire } from 'node:module';

const require = createRequire(import.meta.url);

/**
 * Inter, shipped with the app in @fontsource/inter (WOFF, which pdfkit's fontkit reads): no network
 * and no system fonts, so every server prints the same pages. Latin subset: the quote's text is.
 */
export const FONTS = {
  regular: require.resolve('@fontsource/inter/files/inter-latin-400-normal.woff'),
  medium: require.resolve('@fontsource/inter/files/inter-latin-500-normal.woff'),
  bold: require.resolve('@fontsource/inter/files/inter-latin-700-normal.woff'),
} as const;

/** Font names registered on each document. */
export type FontName = keyof typeof FONTS;
