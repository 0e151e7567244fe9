import { useEffect, useState } from 'react';
import { SearchInput } from './search-input';

const DEBOUNCE_MS = 250;

/** Searches tags as the user types, committing after a short pause. */
export function TagSearch({ value, onSearch }: { value: string; onSearch: (q: string) => void }) {
  const [text, setText] = useState(value);
  const [committed, setCommitted] = useState(value);

  // The URL changed from elsewhere (back button, "clear filters"): show what it now says.
  if (value !== committed) {
    setCommitted(value);
    if (value !== text.trim()) setText(value);
  }

  useEffect(() => {
    const q = text.trim();
    if (q === value) return;
    const timer = setTimeout(() => onSearch(q), DEBOUNCE_MS);
    return () => clearTimeout(timer);
  }, [text, value, onSearch]);

  return (
    <div className="flex flex-col gap-1">
      <label htmlFor="tag-search" className="text-sm font-bold">
        Search by tag
      </label>
      <SearchInput id="tag-search" value={text} onChange={setText} />
    </div>
  );
}
