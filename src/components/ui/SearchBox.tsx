import { useState, type FormEvent } from 'react';
import { Button } from './Button';
import { Input } from './Input';

/** Props of {@link SearchBox}. */
export interface SearchBoxProps {
  /** Accessible label, e.g. "Search jobs". */
  label: string;
  value: string;
  onSearch: (q: string) => void;
  placeholder?: string;
}

/** A search field that applies on Enter or the Search button (one request per search, not per key). */
export function SearchBox({ label, value, onSearch, placeholder }: SearchBoxProps) {
  const [text, setText] = useState(value);
  const [applied, setApplied] = useState(value);
  if (value !== applied) {
    // The URL changed under us (Back button): show what is applied.
    setApplied(value);
    setText(value);
  }
  const submit = (event: FormEvent) => {
    event.preventDefault();
    onSearch(text.trim());
  };
  return (
    <form role="search" onSubmit={submit} className="flex w-full max-w-md gap-2">
      <label htmlFor="list-search" className="sr-only">
        {label}
      </label>
      <Input
        id="list-search"
        type="search"
        value={text}
        placeholder={placeholder}
        onChange={(event) => setText(event.target.value)}
      />
      <Button type="submit" variant="secondary">
        Search
      </Button>
    </form>
  );
}
