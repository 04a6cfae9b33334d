import PdfPrinter from 'pdfmake';
import { cardFonts } from './fonts';
import { type CardInput, COMPACT, type Paper, planCardDefinition, REGULAR } from './plan-card';

const printer = new PdfPrinter(cardFonts);

/**
 * Renders a plan's printed card to PDF bytes. A card that would run onto a second page is laid
 * out again with smaller text and diagrams; a long training session may still take two.
 */
export function renderPlanPdf(input: CardInput, paper: Paper = 'a4'): Promise<Buffer> {
  let pages = 0;
  let doc = printer.createPdfKitDocument(planCardDefinition(input, paper, REGULAR, (n) => (pages = n)));
  if (pages > 1) doc = printer.createPdfKitDocument(planCardDefinition(input, paper, COMPACT));
  return new Promise((resolve, reject) => {
    const chunks: Buffer[] = [];
    doc.on('data', (chunk: Buffer) => chunks.push(chunk));
    doc.on('end', () => resolve(Buffer.concat(chunks)));
    doc.on('error', reject);
    doc.end();
  });
}
