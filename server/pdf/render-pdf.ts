import { createHash } from 'node:crypto';
import PdfPrinter from 'pdfmake';
import { currentLanguage } from '../i18n/translations';
import { cardFonts } from './fonts';
import {
  type CardDensity,
  type CardInput,
  COMPACT,
  type Paper,
  planCardDefinition,
  REGULAR,
  SMALLEST,
  TIGHT,
} from './plan-card';

const printer = new PdfPrinter(cardFonts);

const DENSITIES: CardDensity[] = [REGULAR, COMPACT, TIGHT, SMALLEST];

// Which density a card ended at, by what it prints: printing the same card again (the coach
// prints, then shares; an assistant prints) lays it out once instead of trying each size again.
const fitted = new Map<string, number>();
const MAX_FITTED = 500;

function cardKey(input: CardInput, paper: Paper): string {
  return createHash('sha1')
    .update(`${paper}\n${currentLanguage()}\n${JSON.stringify(input)}`)
    .digest('base64');
}

/**
 * Renders a plan's printed card to PDF bytes. A card that would run onto a second page is laid
 * out again with smaller text and diagrams; a long training session may still take two.
 */
export function renderPlanPdf(input: CardInput, paper: Paper = 'a4'): Promise<Buffer> {
  const key = cardKey(input, paper);
  const known = fitted.get(key);
  let pages = 0;
  let doc!: PDFKit.PDFDocument;
  let used = 0;
  for (let i = known ?? 0; i < DENSITIES.length; i++) {
    used = i;
    doc = printer.createPdfKitDocument(planCardDefinition(input, paper, DENSITIES[i]!, (n) => (pages = n)));
    if (known !== undefined || pages <= 1) break;
  }
  if (known === undefined) {
    if (fitted.size >= MAX_FITTED) fitted.delete(fitted.keys().next().value!);
    fitted.set(key, used);
  }
  return new Promise((resolve, reject) => {
    const chunks: Buffer[] = [];
    doc.on('data', (chunk: Buffer) => chunks.push(chunk));
    doc.on('end', () => resolve(Buffer.concat(chunks)));
    doc.on('error', reject);
    doc.end();
  });
}
