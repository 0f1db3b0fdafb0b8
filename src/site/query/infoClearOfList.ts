/**
 * Where the SQL editor's completion list shows a column's meaning (its unit is in the list
 * itself). Beside the list when there is room, as CodeMirror does by default. On a narrow screen
 * CodeMirror puts the meaning just under the selected option and over the options after it, so
 * that on a phone two or three column names are hidden while it is open; here it goes below the
 * whole list instead (above it when there is more room there), and covers none of them.
 */
import { Direction, type EditorView, type Rect } from '@codemirror/view';

/** CodeMirror's widest meaning panel, in CSS pixels (its `Info.Width`). */
const INFO_MAX_WIDTH = 400;

/** The class of a meaning panel placed clear of the list (styled in sqlEditor.ts's theme). */
export const CLEAR_OF_LIST_CLASS = 'cm-completionInfo-clear';

/** What CodeMirror's `positionInfo` returns: inline style and class of the meaning panel. */
export interface InfoPlacement {
  style: string;
  class: string;
}

/**
 * CodeMirror's `autocompletion({ positionInfo })`: all rectangles in viewport pixels (`space`
 * is the area the tooltips may use); the result's offsets are relative to the list's own box,
 * divided by the list's scale when an ancestor is transformed (as CodeMirror does).
 * @param view - the editor (its text direction picks the preferred side).
 * @param list - the completion list.
 * @param option - the selected option.
 * @param info - the meaning panel at its natural size.
 * @param space - the space available to tooltips.
 * @param tooltip - the list's element, for its unscaled size (CodeMirror passes it, though its
 *   declared type does not say so; without it no scale is assumed).
 */
export function infoClearOfList(view: Pick<EditorView, 'textDirection'>, list: Rect, option: Rect, info: Rect, space: Rect, tooltip?: Pick<HTMLElement, 'offsetWidth' | 'offsetHeight' | 'clientLeft'>): InfoPlacement {
  const rtl = view.textDirection === Direction.RTL;
  const spaceLeft = list.left - space.left;
  const spaceRight = space.right - list.right;
  const width = info.right - info.left;
  const height = info.bottom - info.top;
  const listHeight = list.bottom - list.top;
  const scaleY = tooltip && tooltip.offsetHeight > 0 ? listHeight / tooltip.offsetHeight : 1;
  const scaleX = tooltip && tooltip.offsetWidth > 0 ? (list.right - list.left) / tooltip.offsetWidth : 1;
  // Beside the list, on the reading side unless the other has room and this one has not.
  let left = rtl;
  if (left && spaceLeft < Math.min(width, spaceRight)) left = false;
  else if (!left && spaceRight < Math.min(width, spaceLeft)) left = true;
  const beside = left ? spaceLeft : spaceRight;
  if (width <= beside) {
    // Level with the selected option, kept inside the space.
    const top = Math.max(space.top, Math.min(option.top, space.bottom - height)) - list.top;
    const maxWidth = Math.min(INFO_MAX_WIDTH, beside);
    return { style: `top: ${top / scaleY}px; max-width: ${maxWidth / scaleX}px`, class: `cm-completionInfo-${left ? 'left' : 'right'}` };
  }
  // No room beside: below the list, or above it when there is more room there and not enough below.
  const below = space.bottom - list.bottom;
  const above = list.top - space.top;
  const vertical = below >= height || below >= above ? `top: ${listHeight / scaleY}px` : `bottom: ${listHeight / scaleY}px`;
  // Its outer edge on the list's (offsets start inside the list's border), as wide as the space allows from there.
  const border = tooltip?.clientLeft ?? 0;
  const maxWidth = Math.min(INFO_MAX_WIDTH, rtl ? list.right - space.left : space.right - list.left);
  const edge = `${rtl ? 'right' : 'left'}: ${-border}px`;
  return { style: `${vertical}; ${edge}; max-width: ${maxWidth / scaleX}px`, class: CLEAR_OF_LIST_CLASS };
}
