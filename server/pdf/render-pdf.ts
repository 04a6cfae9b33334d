import PdfPrinter from 'pdfmake';
import { cardFonts } from './fonts';
import { type CardInput, type Paper, planCardDefinition } from './plan-card';

const printer = new PdfPrinter(cardFonts);

/** Renders a plan's printed card to PDF bytes. */
export function renderPlanPdf(input: CardInput, paper: Paper = 'a4'): Promise<Buffer> {
  const doc = printer.createPdfKitDocument(planCardDefinition(input, paper));
  return new Promise((resolve, reject) => {
    const chunks: Buffer[] = [];
    doc.on('data', (chunk: Buffer) => chunks.push(chunk));
    doc.on('end', () => resolve(Buffer.concat(chunks)));
    doc.on('error', reject);
    doc.end();
  });
}
