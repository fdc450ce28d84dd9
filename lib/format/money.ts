// The one way money is written for people, in the product and in its e-mails and PDFs.

/** Whole pence as pounds for people: 123456 → "£1,234.56". */
export function formatPence(pence: number): string {
  const sign = pence < 0 ? '−' : '';
  return `${sign}£${(Math.abs(pence) / 100).toLocaleString('en-GB', { minimumFractionDigits: 2, maximumFractionDigits: 2 })}`;
}

/** Millimetres as metres to one decimal: 12345 → "12.3 m". */
export function formatMetres(mm: number): string {
  return `${(mm / 1000).toLocaleString('en-GB', { minimumFractionDigits: 1, maximumFractionDigits: 1 })} m`;
}
