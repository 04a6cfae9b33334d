/**
 * Gives a font a PostScript name of its own. The subsets of one family (Roboto Condensed Latin,
 * Latin Extended, Greek…) share one name, and pdfkit keeps one font per name in a document: a
 * second subset would be taken for the first and the document would never finish. The name's
 * last characters are overwritten in place (same length), in every name record that holds it
 * (OpenType "name" table, name ID 6).
 */
export function renamePostscript(sfnt: Buffer, suffix: string): Buffer {
  const out = Buffer.from(sfnt);
  const numTables = out.readUInt16BE(4);
  for (let i = 0; i < numTables; i++) {
    const record = 12 + i * 16;
    if (out.toString('latin1', record, record + 4) !== 'name') continue;
    const table = out.readUInt32BE(record + 8);
    const count = out.readUInt16BE(table + 2);
    const strings = table + out.readUInt16BE(table + 4);
    for (let r = 0; r < count; r++) {
      const entry = table + 6 + r * 12;
      if (out.readUInt16BE(entry + 6) !== 6) continue;
      const platform = out.readUInt16BE(entry);
      const length = out.readUInt16BE(entry + 8);
      const start = strings + out.readUInt16BE(entry + 10);
      const wide = platform === 0 || platform === 3;
      const bytes = wide ? Buffer.from(suffix, 'utf16le').swap16() : Buffer.from(suffix, 'latin1');
      if (bytes.length <= length) bytes.copy(out, start + length - bytes.length);
    }
  }
  return out;
}
