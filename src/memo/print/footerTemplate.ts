// The page footer Chromium prints in the bottom margin (CSS page counters do not reach the
// margin boxes in Chromium's print path). Its own tiny document: inline styles, no fonts to
// fetch. The span classes are the ones Chromium fills in.
import Handlebars from 'handlebars';
import { PAGE_FOOTER } from '../wording.js';

export function footerTemplate(label: string): string {
  const text = Handlebars.Utils.escapeExpression(label);
  return (
    '<div style="width:100%;margin:0 17mm;display:flex;justify-content:space-between;' +
    'font-family:Helvetica,Arial,\'Liberation Sans\',sans-serif;font-size:7pt;color:#6b6f76;">' +
    `<span>${text}</span>` +
    `<span>${PAGE_FOOTER.page} <span class="pageNumber"></span> ${PAGE_FOOTER.of} <span class="totalPages"></span></span>` +
    '</div>'
  );
}
