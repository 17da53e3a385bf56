import type { Page } from 'playwright-core';

/**
 * Layout checks run inside the page at one window width. Each answers a
 * list of problems in words (empty when the page is sound), so a failing
 * test names the element and the width.
 */

/**
 * Nothing sticks out sideways: the page does not scroll sideways, and every
 * visible element lies within the window unless it sits in a sideways
 * scroller (overflow-x auto or scroll) that itself fits. A table cut off by
 * a clipping parent counts as sticking out: that is how a column goes
 * missing without a sign.
 */
export function sidewaysProblems(page: Page): Promise<string[]> {
  return page.evaluate(() => {
    const width = window.innerWidth;
    const problems: string[] = [];
    const root = document.documentElement;
    if (root.scrollWidth > width) problems.push(`the page scrolls sideways: ${root.scrollWidth} px wide in a ${width} px window`);
    const name = (el: Element) => {
      const id = el.getAttribute('data-testid') ?? el.closest('[data-testid]')?.getAttribute('data-testid') ?? '';
      return `<${el.tagName.toLowerCase()}${id ? ` in ${id}` : ''}> "${(el.textContent ?? '').trim().slice(0, 40)}"`;
    };
    const scrollsSideways = (el: Element) => ['auto', 'scroll'].includes(getComputedStyle(el).overflowX);
    for (const el of Array.from(document.body.querySelectorAll('*'))) {
      const r = el.getBoundingClientRect();
      if (r.width === 0 || r.height === 0 || (r.right <= width + 1 && r.left >= -1)) continue;
      if (!el.checkVisibility({ visibilityProperty: true, opacityProperty: true })) continue;
      let scroller: Element | null = el.parentElement;
      while (scroller && !scrollsSideways(scroller)) scroller = scroller.parentElement;
      const box = scroller?.getBoundingClientRect();
      if (box && box.right <= width + 1 && box.left >= -1) continue;
      problems.push(`${name(el)} spans ${Math.round(r.left)}–${Math.round(r.right)} px in a ${width} px window`);
      if (problems.length > 5) break;
    }
    return problems;
  });
}

/** No two boxes (sections, titled blocks, notices: `data-box`) overlap unless one holds the other. */
export function overlapProblems(page: Page): Promise<string[]> {
  return page.evaluate(() => {
    const boxes = Array.from(document.querySelectorAll('[data-box]')).filter((el) => el.checkVisibility({ visibilityProperty: true }));
    const rects = boxes.map((el) => el.getBoundingClientRect());
    const title = (el: Element) => (el.querySelector('[role="heading"]')?.textContent ?? el.textContent ?? '').trim().slice(0, 40);
    const problems: string[] = [];
    for (let i = 0; i < boxes.length; i++) {
      for (let j = i + 1; j < boxes.length; j++) {
        if (boxes[i].contains(boxes[j]) || boxes[j].contains(boxes[i])) continue;
        const a = rects[i];
        const b = rects[j];
        const across = Math.min(a.right, b.right) - Math.max(a.left, b.left);
        const down = Math.min(a.bottom, b.bottom) - Math.max(a.top, b.top);
        if (across > 1 && down > 1) problems.push(`"${title(boxes[i])}" and "${title(boxes[j])}" overlap by ${Math.round(down)} px`);
      }
    }
    return problems;
  });
}

export type TableReach = { label: string; overflows: boolean; problems: string[] };

/**
 * Every visible table: each column head can be brought into view (scrolled
 * to inside its own scroller, which fits the window), and a table wider than
 * its card shows the "scroll sideways" cue and the edge fade and holds its
 * first column at the left edge when scrolled. Scrollers are
 * put back where they were.
 */
export function tableReach(page: Page): Promise<TableReach[]> {
  return page.evaluate(() => {
    const width = window.innerWidth;
    const scrollsSideways = (el: Element) => ['auto', 'scroll'].includes(getComputedStyle(el).overflowX);
    const tables = Array.from(document.querySelectorAll('[role="table"]')).filter((el) => el.checkVisibility({ visibilityProperty: true }));
    return tables.map((table) => {
      const label = table.getAttribute('aria-label') ?? table.getAttribute('data-testid') ?? 'a table';
      const problems: string[] = [];
      let scroller: HTMLElement | null = table.parentElement;
      while (scroller && !scrollsSideways(scroller)) scroller = scroller.parentElement;
      // The page's own vertical scroller does not count: only one that scrolls this table sideways.
      const sideways = scroller && scroller.contains(table) && scroller.scrollWidth > scroller.clientWidth + 1 ? scroller : null;
      if (sideways) {
        // Checked before anything scrolls: the fade follows the scroll position a frame later.
        const wrap = sideways.parentElement?.parentElement;
        const cue = wrap?.querySelector('[data-testid="side-scroll-cue"]');
        const fade = wrap?.querySelector('[data-testid="side-scroll-fade"]');
        if (!cue?.checkVisibility()) problems.push('wider than its card but no "scroll sideways" cue');
        if (sideways.scrollLeft === 0 && !fade?.checkVisibility()) problems.push('wider than its card but no edge fade while more lies to the right');
      }
      const before = sideways?.scrollLeft ?? 0;
      const heads = Array.from(table.querySelectorAll('[role="columnheader"]'));
      const cells = heads.length > 0 ? heads : Array.from(table.querySelectorAll('[role="cell"]'));
      for (const head of cells) {
        head.scrollIntoView({ block: 'nearest', inline: 'nearest' });
        const r = head.getBoundingClientRect();
        const bounds = sideways ? sideways.getBoundingClientRect() : { left: 0, right: width };
        if (r.width > 0 && (r.left < Math.max(bounds.left, 0) - 1 || r.right > Math.min(bounds.right, width) + 1)) {
          problems.push(`"${(head.textContent ?? '').trim()}" cannot be brought into view (${Math.round(r.left)}–${Math.round(r.right)} px)`);
        }
      }
      if (sideways && heads.length > 0) {
        // Scrolled to the far end, the first column (what each row is) is still held at the left edge.
        sideways.scrollLeft = sideways.scrollWidth;
        const first = heads[0].getBoundingClientRect();
        const edge = sideways.getBoundingClientRect().left;
        if (Math.abs(first.left - edge) > 1) problems.push(`the first column is not held at the left edge when scrolled (${Math.round(first.left)} px, edge ${Math.round(edge)} px)`);
      }
      if (sideways) sideways.scrollLeft = before;
      return { label, overflows: sideways !== null, problems };
    });
  });
}
