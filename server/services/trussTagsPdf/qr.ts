import QRCode from 'qrcode';
import type { Doc } from '../quotePdf/theme';

/** Light modules around the symbol (ISO/IEC 18004 asks for 4). */
const QUIET_ZONE = 4;

/**
 * A QR code (qrcode package, error correction M) drawn as vector squares in a `size`-point
 * square at (x, y), quiet zone included: sharp at any printer resolution.
 */
export function drawQr(doc: Doc, text: string, x: number, y: number, size: number) {
  const { modules } = QRCode.create(text, { errorCorrectionLevel: 'M' });
  const n = modules.size;
  const cell = size / (n + 2 * QUIET_ZONE);
  doc.save();
  doc.rect(x, y, size, size).fill('#ffffff');
  for (let r = 0; r < n; r++) {
    for (let c = 0; c < n; c++) {
      if (modules.get(r, c)) {
        // A hair of overlap so neighbouring squares print without hairline gaps.
        doc.rect(
          x + (c + QUIET_ZONE) * cell,
          y + (r + QUIET_ZONE) * cell,
          cell + 0.05,
          cell + 0.05,
        );
      }
    }
  }
  doc.fill('#000000');
  doc.restore();
}
