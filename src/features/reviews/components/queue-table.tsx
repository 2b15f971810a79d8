import { ArrowDown, ArrowUp, ArrowUpDown } from 'lucide-react';
import { Link } from 'react-router-dom';
import {
  createColumnHelper,
  functionalUpdate,
  rowSortingFeature,
  tableFeatures,
  useTable,
  type SortingState,
  type Updater,
} from '@tanstack/react-table';
import { QUEUE_SORTS, type ReviewQueueRow } from '@shared/schemas/review';
import { paths } from '@/config/paths';
import { waitingFor } from './waiting-time';

type Sort = (typeof QUEUE_SORTS)[number];
const features = tableFeatures({ rowSortingFeature });
const helper = createColumnHelper<typeof features, ReviewQueueRow>();

const columns = helper.columns([
  helper.display({
    id: 'photo',
    header: () => <span className="sr-only">First photo</span>,
    cell: ({ row }) =>
      row.original.thumbUrl ? (
        <img src={row.original.thumbUrl} alt="" className="size-14 rounded border border-rule object-cover" />
      ) : (
        <span className="block size-14 rounded border border-dashed border-rule" />
      ),
  }),
  helper.accessor((r) => r.apprentice.name, {
    id: 'apprentice',
    header: 'Apprentice',
    cell: ({ row }) => (
      <span>
        <span className="font-semibold">{row.original.apprentice.name}</span>
        {row.original.className && <span className="block text-xs text-muted">{row.original.className}</span>}
      </span>
    ),
  }),
  helper.accessor((r) => r.project.title, {
    id: 'project',
    header: 'Project',
    cell: ({ row }) => (
      <span>
        <span className="font-semibold">{row.original.project.title}</span>
        <span className="block text-xs text-muted">{row.original.course.title}</span>
      </span>
    ),
  }),
  helper.accessor('version', {
    header: 'Version',
    enableSorting: false,
    cell: ({ row }) => (
      <span className="num">
        {row.original.version}{' '}
        <span className="font-sans text-xs text-muted">
          · {row.original.photoCount} photo{row.original.photoCount === 1 ? '' : 's'}
        </span>
      </span>
    ),
  }),
  helper.accessor('sentAt', {
    id: 'waiting',
    header: 'Waiting',
    cell: ({ row }) => (
      <time
        dateTime={row.original.sentAt}
        title={new Date(row.original.sentAt).toLocaleString()}
        className="num whitespace-nowrap"
      >
        {waitingFor(row.original.sentAt)}
      </time>
    ),
  }),
  helper.display({
    id: 'open',
    header: () => <span className="sr-only">Open</span>,
    cell: ({ row }) => (
      <Link
        to={paths.review(row.original.submissionId)}
        className="inline-flex min-h-11 items-center rounded-md bg-steel px-4 text-sm font-semibold text-white no-underline hover:bg-steel-dark"
      >
        Review
        <span className="sr-only">
          : {row.original.project.title} by {row.original.apprentice.name}
        </span>
      </Link>
    ),
  }),
]);

interface Props {
  rows: ReviewQueueRow[];
  sort: Sort;
  dir: 'asc' | 'desc';
  onSort: (sort: Sort, dir: 'asc' | 'desc') => void;
}

/** The waiting pieces; sorting is the server's, the table only reports which header was chosen. */
export function QueueTable({ rows, sort, dir, onSort }: Props) {
  const sorting: SortingState = [{ id: sort, desc: dir === 'desc' }];
  const table = useTable({
    features,
    columns,
    data: rows,
    manualSorting: true,
    enableSortingRemoval: false,
    state: { sorting },
    onSortingChange: (updater: Updater<SortingState>) => {
      const [next] = functionalUpdate(updater, sorting);
      if (next && (QUEUE_SORTS as readonly string[]).includes(next.id))
        onSort(next.id as Sort, next.desc ? 'desc' : 'asc');
    },
  });

  return (
    <div className="overflow-x-auto rounded-lg border border-rule bg-card">
      <table className="w-full border-collapse text-left text-sm">
        <caption className="sr-only">Pieces waiting for review</caption>
        <thead className="border-b border-rule bg-paper/60">
          {table.getHeaderGroups().map((group) => (
            <tr key={group.id}>
              {group.headers.map((header) => {
                const sorted = header.column.getIsSorted();
                return (
                  <th
                    key={header.id}
                    scope="col"
                    aria-sort={sorted === 'asc' ? 'ascending' : sorted === 'desc' ? 'descending' : undefined}
                    className="px-3 py-2 font-semibold"
                  >
                    {header.column.getCanSort() ? (
                      <button
                        type="button"
                        onClick={header.column.getToggleSortingHandler()}
                        className="inline-flex min-h-11 items-center gap-1 hover:text-steel"
                      >
                        <table.FlexRender header={header} />
                        {sorted === 'asc' ? (
                          <ArrowUp className="size-4" aria-hidden />
                        ) : sorted === 'desc' ? (
                          <ArrowDown className="size-4" aria-hidden />
                        ) : (
                          <ArrowUpDown className="size-4 text-muted" aria-hidden />
                        )}
                      </button>
                    ) : (
                      <table.FlexRender header={header} />
                    )}
                  </th>
                );
              })}
            </tr>
          ))}
        </thead>
        <tbody>
          {table.getRowModel().rows.map((row) => (
            <tr key={row.id} className="border-b border-rule/60 last:border-0">
              {row.getAllCells().map((cell) => (
                <td key={cell.id} className="px-3 py-2 align-middle">
                  <table.FlexRender cell={cell} />
                </td>
              ))}
            </tr>
          ))}
        </tbody>
      </table>
    </div>
  );
}
