import { describe, expect, it } from 'vitest';
import { Direction, type Rect } from '@codemirror/view';
import { CLEAR_OF_LIST_CLASS, infoClearOfList } from '../../../src/site/query/infoClearOfList.ts';

const ltr = { textDirection: Direction.LTR };
const rtl = { textDirection: Direction.RTL };
const rect = (left: number, top: number, width: number, height: number): Rect => ({ left, top, right: left + width, bottom: top + height });
/** The list's element at scale 1, with a 1 px border. */
const unscaled = (list: Rect) => ({ offsetWidth: list.right - list.left, offsetHeight: list.bottom - list.top, clientLeft: 1 });

/** The meaning panel's box in viewport pixels, from the placement's offsets (scale 1, as CSS positions it in the list). */
function placedBox(style: string, list: Rect, info: Rect, border: number): Rect {
  const px = (key: string): number | null => {
    const m = new RegExp(`(?:^|;\\s*)${key}: (-?[\\d.]+)px`).exec(style);
    return m ? Number(m[1]) : null;
  };
  const width = Math.min(info.right - info.left, px('max-width') ?? Infinity);
  const height = info.bottom - info.top;
  const innerLeft = list.left + border;
  const innerTop = list.top + border;
  const left = px('left') !== null ? innerLeft + px('left')! : list.right - border - px('right')! - width;
  const top = px('top') !== null ? innerTop + px('top')! : list.bottom - border - px('bottom')! - height;
  return { left, top, right: left + width, bottom: top + height };
}
const overlaps = (a: Rect, b: Rect): boolean => a.left < b.right && b.left < a.right && a.top < b.bottom && b.top < a.bottom;

describe('infoClearOfList', () => {
  it('puts the meaning beside the list, level with the selected option, when there is room (as CodeMirror does)', () => {
    // A 1280 px page: the list at x 147–403, the meaning 304 px wide.
    const space = rect(0, 0, 1280, 900);
    const list = rect(147, 276, 256, 149);
    const option = rect(148, 296, 254, 19);
    const info = rect(0, 0, 304, 29);
    const p = infoClearOfList(ltr, list, option, info, space, unscaled(list));
    expect(p.class).toBe('cm-completionInfo-right');
    expect(p.style).toBe('top: 20px; max-width: 400px');
    // Kept inside the space: an option near the bottom lifts the meaning.
    const low = infoClearOfList(ltr, list, rect(148, 890, 254, 19), info, space, unscaled(list));
    expect(low.style).toBe(`top: ${900 - 29 - 276}px; max-width: 400px`);
  });

  it('goes to the left when only the left has room, and to the left first in a right-to-left editor', () => {
    const space = rect(0, 0, 1000, 900);
    const list = rect(700, 100, 256, 149);
    const option = rect(700, 100, 256, 19);
    const info = rect(0, 0, 300, 40);
    const p = infoClearOfList(ltr, list, option, info, space, unscaled(list));
    expect(p.class).toBe('cm-completionInfo-left');
    expect(p.style).toBe('top: 0px; max-width: 400px');
    const r = infoClearOfList(rtl, rect(400, 100, 256, 149), option, info, space);
    expect(r.class).toBe('cm-completionInfo-left');
    // Room on the left narrower than the panel's 400 px limit: the limit is the room.
    const tight = infoClearOfList(ltr, rect(650, 100, 256, 149), option, rect(0, 0, 320, 40), rect(0, 0, 980, 900));
    expect(tight).toEqual({ class: 'cm-completionInfo-left', style: 'top: 0px; max-width: 400px' });
    const tighter = infoClearOfList(ltr, rect(330, 100, 256, 149), option, rect(0, 0, 320, 40), rect(0, 0, 660, 900));
    expect(tighter).toEqual({ class: 'cm-completionInfo-left', style: 'top: 0px; max-width: 330px' });
  });

  it('on a phone puts the meaning below the whole list, covering no option, within the screen', () => {
    // Measured in Chromium at 390 × 844: the list at x 115–371, y 510–659; the meaning 245 px wide.
    const space = rect(0, 0, 390, 844);
    const list = rect(115, 510, 256, 149);
    const option = rect(116, 511, 254, 19);
    const info = rect(0, 0, 245, 50);
    const p = infoClearOfList(ltr, list, option, info, space, unscaled(list));
    expect(p.class).toBe(CLEAR_OF_LIST_CLASS);
    expect(p.style).toBe('top: 149px; left: -1px; max-width: 275px');
    const box = placedBox(p.style, list, info, 1);
    expect(overlaps(box, list)).toBe(false);
    // Offsets start inside the list's 1 px border: a pixel's gap below it, outer left edges flush.
    expect(box.top).toBe(list.bottom + 1);
    expect(box.left).toBe(list.left);
    expect(box.right).toBeLessThanOrEqual(space.right);
    // CodeMirror's own narrow place (30 px in, just under the selected option) covers the options below it.
    const theirs = rect(list.left + 30, option.bottom, 245, 50);
    expect(overlaps(theirs, list)).toBe(true);
  });

  it('puts it above the list when there is not enough room below and more above', () => {
    const space = rect(0, 0, 390, 700);
    const list = rect(115, 560, 256, 120);
    const info = rect(0, 0, 245, 60);
    const p = infoClearOfList(ltr, list, rect(116, 561, 254, 19), info, space, unscaled(list));
    expect(p.style).toBe('bottom: 120px; left: -1px; max-width: 275px');
    const box = placedBox(p.style, list, info, 1);
    expect(overlaps(box, list)).toBe(false);
    expect(box.bottom).toBe(list.top - 1);
    // Not enough room either way: the larger side (here below) is used.
    const cramped = infoClearOfList(ltr, rect(115, 100, 256, 300), rect(116, 101, 254, 19), rect(0, 0, 245, 400), rect(0, 0, 390, 640));
    expect(cramped.style.startsWith('top: 300px')).toBe(true);
    const cramped2 = infoClearOfList(ltr, rect(115, 320, 256, 300), rect(116, 321, 254, 19), rect(0, 0, 245, 400), rect(0, 0, 390, 640));
    expect(cramped2.style.startsWith('bottom: 300px')).toBe(true);
  });

  it('aligns with the list\'s right edge in a right-to-left editor, and divides by the list\'s scale', () => {
    const space = rect(0, 0, 390, 844);
    const list = rect(20, 510, 256, 149);
    const info = rect(0, 0, 245, 50);
    const p = infoClearOfList(rtl, list, rect(21, 511, 254, 19), info, space, unscaled(list));
    expect(p).toEqual({ class: CLEAR_OF_LIST_CLASS, style: 'top: 149px; right: -1px; max-width: 276px' });
    // The page zoomed by a transform to twice the size: CSS offsets are half the viewport pixels.
    const scaled = infoClearOfList(ltr, list, rect(21, 511, 254, 19), info, space, { offsetWidth: 128, offsetHeight: 74.5, clientLeft: 1 });
    expect(scaled.style).toBe('top: 74.5px; left: -1px; max-width: 185px');
    // Without the element (CodeMirror's declared signature) no scale is assumed.
    expect(infoClearOfList(ltr, list, rect(21, 511, 254, 19), info, space).style).toBe('top: 149px; left: 0px; max-width: 370px');
  });
});
