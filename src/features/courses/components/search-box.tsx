import { useId, useState, type FormEvent } from 'react';
import { Search } from 'lucide-react';
import { useNavigate } from 'react-router-dom';
import { paths } from '@/config/paths';

/** Searches every lesson; sends the reader to the search page with the words in the address. */
export function SearchBox({ initial = '', autoFocus = false }: { initial?: string; autoFocus?: boolean }) {
  const [q, setQ] = useState(initial);
  const navigate = useNavigate();
  const id = useId();
  const submit = (e: FormEvent) => {
    e.preventDefault();
    if (q.trim().length >= 2) navigate(paths.search(q.trim()));
  };
  return (
    <form role="search" onSubmit={submit} className="flex items-stretch gap-2">
      <label htmlFor={id} className="sr-only">
        Search the lessons
      </label>
      <input
        id={id}
        type="search"
        value={q}
        onChange={(e) => setQ(e.target.value)}
        placeholder="Search the lessons"
        minLength={2}
        maxLength={100}
        autoFocus={autoFocus}
        className="min-h-11 w-64 max-w-full rounded-md border border-rule bg-white px-3 text-ink placeholder:text-muted/70 focus:border-steel"
      />
      <button
        type="submit"
        className="inline-flex min-h-11 min-w-11 items-center justify-center rounded-md bg-steel px-3 text-white hover:bg-steel-dark"
      >
        <Search className="size-5" aria-hidden />
        <span className="sr-only">Search</span>
      </button>
    </form>
  );
}
