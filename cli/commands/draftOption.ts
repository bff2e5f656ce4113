/**
 * The single `--draft <m>` of the commands that work at one waterline (sheet, areas),
 * read with the drafts-list rules of core/common/draftList.ts.
 */
import { fail } from '../../core/common/errors.js';
import { parseDraftList } from '../../core/common/draftList.js';

export function singleDraft(text: string | undefined): number {
  const list = parseDraftList(text ?? '', ['draft']);
  if (list.length !== 1) fail('HYD_BAD_ARGUMENT', ['draft'], `--draft takes one draft in metres, e.g. --draft 1.3; '${(text ?? '').slice(0, 40)}' gives ${list.length}`);
  return list[0]!;
}
