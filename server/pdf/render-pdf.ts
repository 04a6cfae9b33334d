import PdfPrinter from 'pdfmake';
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

/**
 * Renders a plan's printed card to PDF bytes. A card that would run onto a second page is laid
 * out again with smaller text and diagrams; a long training session may still take two.
 */
export function renderPlanPdf(input: CardInput, paper: Paper = 'a4'): Promise<Buffer> {
  let pages = 0;
  let doc!: PDFKit.PDFDocument;
  for (const density of DENSITIES) {
    doc = printer.createPdfKitDocument(planCardDefinition(input, paper, density, (n) => (pages = n)));
    if (pages <= 1) break;
  }
  return new Promise((resolve, reject) => {
    const chunks: Buffer[] = [];
    doc.on('data', (chunk: Buffer) => chunks.push(chunk));
    doc.on('end', () => resolve(Buffer.concat(chunks)));
    doc.on('error', reject);
    doc.end();
  });
}
