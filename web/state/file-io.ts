import { parseBudgetDocument, serializeBudgetDocument, type BudgetDocument } from '../../src';

/**
 * Reads a budget file the user picked or dropped.
 * @throws the document module's BudgetFileError (a SigmaLedgerError) naming the file and field.
 */
export async function readBudgetFile(file: File): Promise<{ document: BudgetDocument; notes: string[] }> {
  return parseBudgetDocument(await file.text(), file.name);
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
