import type { Locator, Page } from 'playwright-core';

/** What a walk through a screen with the Tab key found: controls it never reached and controls focused without a visible mark. */
export type TabWalk = { controls: number; reached: number; unreached: string[]; unmarked: string[] };

/**
 * Marks every control a person could use on the screen now shown (links, buttons, fields, anything
 * with a tabindex of 0 or more; shown, enabled, not inert) and presses Tab until the focus has been
 * round the page, noting each control that took the focus and whether it showed it: an outline or
 * a ring (a box shadow) while focused. The walk ends on the first control reached twice (the focus
 * went past the page's end, through the browser's own toolbar, and back to the top).
 */
export async function tabThrough(page: Page, within: Locator | null = null): Promise<TabWalk> {
  const root = within ?? page.locator('body');
  const names: string[] = await root.evaluate((el) => {
    const selector = 'a[href], button, input:not([type=hidden]), select, textarea, summary, [tabindex]';
    const shown = (c: Element) => c.getClientRects().length > 0 && getComputedStyle(c).visibility !== 'hidden';
    const usable = (c: Element) => !(c as HTMLButtonElement).disabled && !c.closest('[inert]') && (c as HTMLElement).tabIndex >= 0 && !c.closest('dialog:not([open])');
    const controls = [...el.querySelectorAll(selector)].filter((c) => shown(c) && usable(c));
    return controls.map((c, i) => {
      c.setAttribute('data-tab-walk', String(i));
      const label = c.getAttribute('aria-label') ?? (c as HTMLElement).innerText?.trim() ?? '';
      return `${c.tagName.toLowerCase()}${c.getAttribute('type') ? `[${c.getAttribute('type')}]` : ''} "${(label || c.getAttribute('name') || c.getAttribute('placeholder') || '').slice(0, 40)}"`;
    });
  });
  const reached = new Set<number>();
  const unmarked: string[] = [];
  let strayAway = 0;
  let last = -1;
  // A date and time box takes a Tab per part (day, month, year, hours, minutes): room for those.
  for (let press = 0; press < names.length * 3 + 20; press++) {
    await page.keyboard.press('Tab');
    const at = await page.evaluate(() => {
      const el = document.activeElement;
      if (!el || el === document.body) return null;
      const style = getComputedStyle(el);
      const outline = style.outlineStyle !== 'none' && parseFloat(style.outlineWidth) >= 1;
      const ring = style.boxShadow !== 'none' && style.boxShadow !== '';
      return { index: el.getAttribute('data-tab-walk'), marked: outline || ring };
    });
    if (at === null || at.index === null) {
      // Off the page (or on something not counted): a second time means the focus went round.
      if (++strayAway > 2 && reached.size > 0) break;
      continue;
    }
    const index = Number(at.index);
    if (index === last) continue;
    last = index;
    if (reached.has(index)) break;
    reached.add(index);
    if (!at.marked) unmarked.push(names[index]!);
  }
  return { controls: names.length, reached: reached.size, unreached: names.filter((_, i) => !reached.has(i)), unmarked };
}

/** Whether the element that has the focus is inside `container`. */
export async function focusInside(container: Locator): Promise<boolean> {
  return container.evaluate((el) => el.contains(document.activeElement));
}
