// A run that opens the PDF printer, prints one page and then waits to be killed: the browser
// lifecycle test kills it and looks for the browser it left (test/memo/browserLifecycle.test.ts).
import { openPdfPrinter } from '../../src/memo/print/pdfPrinter.js';

const printer = await openPdfPrinter();
await printer.print('<!DOCTYPE html><html><body><p>One page.</p></body></html>', 'A4');
process.stdout.write(`ready ${process.pid}\n`);
setInterval(() => undefined, 1000);
