import type { ReactNode } from 'react';

export interface Column<T> {
  header: string;
  cell: (row: T) => ReactNode;
  /** Figures (dates, serials) set in the mono face and kept on one line. */
  figure?: boolean;
}

interface TableProps<T> {
  caption: string;
  columns: Column<T>[];
  rows: T[];
  rowKey: (row: T) => string | number;
}

/**
 * A real table from the md breakpoint up; below it each row becomes a card with its column names beside the values.
 * The roles are spelled out because changing a table's display can drop its semantics in some browsers.
 */
export function Table<T>({ caption, columns, rows, rowKey }: TableProps<T>) {
  return (
    <table role="table" className="block w-full border-collapse text-left md:table">
      <caption className="sr-only">{caption}</caption>
      <thead role="rowgroup" className="sr-only md:not-sr-only md:table-header-group">
        <tr role="row" className="border-b-2 border-slate/30">
          {columns.map((c) => (
            <th role="columnheader" key={c.header} scope="col" className="px-3 py-2 text-sm font-semibold text-ink-soft">
              {c.header}
            </th>
          ))}
        </tr>
      </thead>
      <tbody role="rowgroup" className="block space-y-3 md:table-row-group md:space-y-0">
        {rows.map((row) => (
          <tr
            role="row"
            key={rowKey(row)}
            className="block rounded-lg border border-frost-deep bg-white p-3 md:table-row md:rounded-none md:border-0 md:border-b md:border-frost-deep md:bg-transparent md:p-0"
          >
            {columns.map((c) => (
              <td
                role="cell"
                key={c.header}
                data-label={c.header}
                className={`flex items-baseline gap-3 py-1 align-baseline before:w-24 before:shrink-0 before:text-sm before:font-semibold before:text-ink-soft before:content-[attr(data-label)] md:table-cell md:px-3 md:py-3 md:before:content-none ${c.figure ? 'md:whitespace-nowrap' : ''}`}
              >
                <span className={`min-w-0 break-words ${c.figure ? 'font-mono text-sm' : ''}`}>{c.cell(row)}</span>
              </td>
            ))}
          </tr>
        ))}
      </tbody>
    </table>
  );
}
