import { MAX_TEXT_CHARS, parseAnyBudgetDocument, serializeBudgetDocument, type BudgetDocument } from '../../src';
import { BudgetFileError } from '../../src';
import { firstInvalidUtf8Byte, invalidUtf8Message } from '../../src';

/**
 * Reads a budget file the user picked or dropped: its size is checked
 * before anything is read, and bytes that are not UTF-8 are refused with
 * the offset of the first one (never replaced silently).
 * @throws the document module's BudgetFileError (a SigmaLedgerError) naming the file and field.
 */
export async function readBudgetFile(file: File): Promise<{ document: BudgetDocument; notes: string[] }> {
  if (file.size > 4 * MAX_TEXT_CHARS) {
    throw new BudgetFileError(file.name, '', `is too large: ${file.size} bytes; a budget file may have at most ${MAX_TEXT_CHARS} characters`);
  }
  const bytes = new Uint8Array(await file.arrayBuffer());
  const text = new TextDecoder('utf-8', { ignoreBOM: true }).decode(bytes);
  const bad = firstInvalidUtf8Byte(bytes, text);
  if (bad >= 0) throw new BudgetFileError(file.name, '', invalidUtf8Message(bytes, bad));
  // Either model: a 3-D budget opens in the 3-D editors (the store holds it as it is).
  const parsed = parseAnyBudgetDocument(text, file.name);
  return { document: parsed.document as BudgetDocument, notes: parsed.notes };
}

/** Offers the document for download as the same JSON the command line reads. */
export function downloadBudget(doc: BudgetDocument, fileName: string): void {
  offerDownload(serializeBudgetDocument(doc), fileName.endsWith('.json') ? fileName : `${fileName}.json`, 'application/json');
}

/** Offers `text` as a file download named `fileName`. */
export function offerDownload(text: string, fileName: string, type: string): void {
  const url = URL.createObjectURL(new Blob([text], { type }));
  const a = document.createElement('a');
  a.href = url;
  a.download = fileName;
  a.click();
  setTimeout(() => URL.revokeObjectURL(url), 1000);
}
