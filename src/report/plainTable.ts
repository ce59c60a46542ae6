import Table from 'cli-table3';

/** Borderless cli-table3 characters: columns separated by one space, as the comps table prints. */
const PLAIN = {
  top: '', 'top-mid': '', 'top-left': '', 'top-right': '',
  bottom: '', 'bottom-mid': '', 'bottom-left': '', 'bottom-right': '',
  left: '', 'left-mid': '', mid: '', 'mid-mid': '',
  right: '', 'right-mid': '', middle: ' ',
};

/** A borderless terminal table with the given header, alignments and widths. */
export function plainTable(head: readonly string[], colAligns: readonly ('left' | 'right')[], colWidths: readonly number[]): Table.Table {
  return new Table({
    head: [...head],
    chars: PLAIN,
    style: { head: [], border: [], 'padding-left': 0, 'padding-right': 1 },
    colAligns: [...colAligns],
    colWidths: [...colWidths],
    wordWrap: true,
  });
}
