import AxeBuilder from '@axe-core/playwright';
import { expect, type Page } from '@playwright/test';

// WCAG 2.0 and 2.1, levels A and AA: the rules axe-core tags with these names.
const WCAG_AA = ['wcag2a', 'wcag2aa', 'wcag21a', 'wcag21aa'];

/** Opens every closed disclosure panel (<details>) on the page, as a reader would. */
export async function openDisclosures(page: Page) {
  const closed = page.locator('main details:not([open]) > summary');
  for (let i = 0; i < 40 && (await closed.count()) > 0; i++) await closed.first().click();
  // Scroll regions learn whether they overflow one frame after they are laid out.
  await page.evaluate(() => new Promise((r) => requestAnimationFrame(() => requestAnimationFrame(r))));
}

/** Waits until client components have fetched: no "Loading…" text left in the main content. */
export async function settle(page: Page) {
  await page.waitForLoadState('networkidle');
  await expect(page.locator('main')).not.toContainText(/Loading\b[^.]*…/);
}

const describe = (v: { id: string; impact?: string | null; help: string; nodes: { target: unknown }[] }) =>
  `${v.id} (${v.impact}): ${v.help}\n    ${v.nodes
    .slice(0, 5)
    .map((n) => JSON.stringify(n.target))
    .join('\n    ')}`;

/** Every WCAG 2.1 A/AA violation axe-core finds, one line each (empty when there are none). */
export async function axeViolations(page: Page, { enhancedContrast = false } = {}): Promise<string[]> {
  const axe = new AxeBuilder({ page });
  // WCAG 1.4.6 (AAA): 7:1 for body text, 4.5:1 for large text. Asked of the saw screens only, in the
  // same pass: axe runs a rule enabled by name beside the tagged ones (options before withTags,
  // which adds to them).
  if (enhancedContrast) axe.options({ rules: { 'color-contrast-enhanced': { enabled: true } } });
  const results = await axe.withTags(WCAG_AA).analyze();
  if (enhancedContrast) {
    const ran = [results.passes, results.violations, results.incomplete, results.inapplicable].flat();
    expect(ran.some((r) => r.id === 'color-contrast-enhanced')).toBe(true);
  }
  return results.violations.map(describe);
}

/**
 * Controls whose edge (border, or fill when borderless) is under 3:1 against what is behind them
 * (WCAG 1.4.11, non-text contrast). Disabled controls are exempt, as WCAG allows.
 */
export async function weakControlEdges(page: Page, scope = 'main'): Promise<string[]> {
  return page.evaluate((scopeSelector) => {
    const parse = (c: string) => {
      const m = c.match(/rgba?\(([^)]+)\)/);
      if (!m) return null;
      const [r, g, b, a = 1] = m[1]
        .split(/[ ,/]+/)
        .filter(Boolean)
        .map(Number);
      return { r, g, b, a };
    };
    const luminance = ({ r, g, b }: { r: number; g: number; b: number }) => {
      const f = (v: number) => ((v /= 255) <= 0.03928 ? v / 12.92 : ((v + 0.055) / 1.055) ** 2.4);
      return 0.2126 * f(r) + 0.7152 * f(g) + 0.0722 * f(b);
    };
    const ratio = (x: { r: number; g: number; b: number }, y: { r: number; g: number; b: number }) => {
      const [hi, lo] = [luminance(x), luminance(y)].sort((p, q) => q - p);
      return (hi + 0.05) / (lo + 0.05);
    };
    const behind = (el: Element | null) => {
      for (let e = el; e; e = e.parentElement) {
        const c = parse(getComputedStyle(e).backgroundColor);
        if (c && c.a > 0.5) return c;
      }
      return { r: 255, g: 255, b: 255, a: 1 };
    };
    const weak: string[] = [];
    const controls = document.querySelectorAll<HTMLElement>(
      `${scopeSelector} button:not([disabled]), ${scopeSelector} a[href], ${scopeSelector} input:not([disabled]), ${scopeSelector} select, ${scopeSelector} textarea`,
    );
    for (const el of controls) {
      const style = getComputedStyle(el);
      if (style.visibility === 'hidden' || el.getClientRects().length === 0) continue;
      const back = behind(el.parentElement);
      const fill = parse(style.backgroundColor);
      const border = parseFloat(style.borderTopWidth) > 0 ? parse(style.borderTopColor) : null;
      const edge = border && border.a > 0.5 ? border : fill && fill.a > 0.5 ? fill : null;
      // A control with no edge or fill of its own is text on the page (a link); text contrast covers it.
      if (!edge) continue;
      const r = ratio(edge, back);
      if (r < 3)
        weak.push(`${el.tagName.toLowerCase()} "${el.textContent?.trim().slice(0, 40)}" ${r.toFixed(2)}:1`);
    }
    return weak;
  }, scope);
}
