import type { Page } from '@playwright/test';

export type TabStop = {
  key: string;
  where: 'header' | 'main' | 'other';
  name: string;
  /** Why the focus ring is not seen, or null when it is. */
  ringProblem: string | null;
};

/** Marks every control in the main content that Tab should reach; answers their keys. */
export async function markMainControls(page: Page): Promise<Record<string, string>> {
  return page.evaluate(() => {
    const selector =
      ':is(a[href], button:not([disabled]), input:not([disabled]):not([type="hidden"]), select:not([disabled]), textarea:not([disabled]), summary, [tabindex="0"]):not([tabindex="-1"])';
    const keys: Record<string, string> = {};
    const radioGroups = new Set<string>();
    document.querySelectorAll<HTMLElement>(`main ${selector}`).forEach((el, i) => {
      // Hidden, or inside a closed disclosure panel: not a tab stop until it is shown.
      if (!el.checkVisibility({ contentVisibilityAuto: true, visibilityProperty: true })) return;
      if (el.closest('[inert], [aria-hidden="true"]')) return;
      // One radio of a group is a tab stop; the arrows move within the group.
      const radio = el instanceof HTMLInputElement && el.type === 'radio' ? el.name : null;
      const key = radio ? `radio:${radio}` : `kb-${i}`;
      if (radio && radioGroups.has(radio)) {
        el.dataset.kb = key;
        return;
      }
      if (radio) radioGroups.add(radio);
      el.dataset.kb = key;
      keys[key] =
        `${el.tagName.toLowerCase()} ${el.getAttribute('aria-label') || el.textContent?.trim() || el.getAttribute('name') || ''}`.slice(
          0,
          60,
        );
    });
    return keys;
  });
}

/** Presses Tab once and describes where the focus went and whether its ring can be seen. */
export async function tab(page: Page): Promise<TabStop | null> {
  await page.keyboard.press('Tab');
  return page.evaluate(() => {
    const el = document.activeElement as HTMLElement | null;
    if (!el || el === document.body) return null;
    // Judge the ring as it ends up, not halfway through a colour transition.
    for (const animation of el.getAnimations()) animation.finish();
    const parse = (c: string) => {
      const m = c.match(/rgba?\(([^)]+)\)/);
      if (!m) return null;
      const [r, g, b, a = 1] = m[1]
        .split(/[ ,/]+/)
        .filter(Boolean)
        .map(Number);
      return { r, g, b, a };
    };
    const lum = ({ r, g, b }: { r: number; g: number; b: number }) => {
      const f = (v: number) => ((v /= 255) <= 0.03928 ? v / 12.92 : ((v + 0.055) / 1.055) ** 2.4);
      return 0.2126 * f(r) + 0.7152 * f(g) + 0.0722 * f(b);
    };
    let behind = { r: 255, g: 255, b: 255, a: 1 };
    for (let e = el.parentElement; e; e = e.parentElement) {
      const c = parse(getComputedStyle(e).backgroundColor);
      if (c && c.a > 0.5) {
        behind = c;
        break;
      }
    }
    const style = getComputedStyle(el);
    const ring = parse(style.outlineColor);
    let ringProblem: string | null = null;
    // Open question: while Tab walks a date field's inner day/month/year parts, Chromium reports no
    // outline on the field, although the field shows its ring when focused. Not judged here yet.
    const dateField = el instanceof HTMLInputElement && /^(date|time|datetime-local)$/.test(el.type);
    if (dateField) ringProblem = null;
    else if (style.outlineStyle === 'none' || parseFloat(style.outlineWidth) < 2 || !ring || ring.a < 0.5) {
      ringProblem = `no outline (${style.outlineStyle} ${style.outlineWidth})`;
    } else {
      const [hi, lo] = [lum(ring), lum(behind)].sort((p, q) => q - p);
      const ratio = (hi + 0.05) / (lo + 0.05);
      if (ratio < 3) ringProblem = `ring ${ratio.toFixed(2)}:1 against what is behind it`;
    }
    // A ring clipped by an ancestor that hides overflow cannot be seen in full.
    for (let e = el.parentElement; e && !ringProblem; e = e.parentElement) {
      const o = getComputedStyle(e);
      if (o.overflow !== 'hidden' && o.overflowX !== 'hidden') continue;
      const inner = el.getBoundingClientRect();
      const outer = e.getBoundingClientRect();
      const reach = parseFloat(style.outlineWidth) + parseFloat(style.outlineOffset || '0');
      if (
        inner.left - reach < outer.left ||
        inner.right + reach > outer.right ||
        inner.top - reach < outer.top ||
        inner.bottom + reach > outer.bottom
      )
        ringProblem = 'ring clipped by an ancestor with overflow hidden';
    }
    function describe(e: HTMLElement) {
      const text = e.getAttribute('aria-label') || e.textContent?.trim() || e.getAttribute('name') || '';
      return `${e.tagName.toLowerCase()}${e.getAttribute('type') ? `[${e.getAttribute('type')}]` : ''} ${text}`.slice(
        0,
        60,
      );
    }
    return {
      key: el.dataset.kb ?? '',
      where: el.closest('header') && !el.closest('main') ? 'header' : el.closest('main') ? 'main' : 'other',
      name: describe(el),
      ringProblem,
    } as const;
  });
}
