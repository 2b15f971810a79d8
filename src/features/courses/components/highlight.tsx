/** Splits text into runs, marking those that are one of the matched words (whole words, any letter case). */
export function splitByTerms(text: string, terms: string[]): { text: string; match: boolean }[] {
  const words = [...new Set(terms.filter(Boolean))].sort((a, b) => b.length - a.length);
  if (words.length === 0) return [{ text, match: false }];
  const escaped = words.map((w) => w.replace(/[.*+?^${}()|[\]\\]/g, '\\$&'));
  const pattern = new RegExp(`(?<![\\p{L}\\p{N}])(${escaped.join('|')})(?![\\p{L}\\p{N}])`, 'giu');
  return text
    .split(pattern)
    .map((part, i) => ({ text: part, match: i % 2 === 1 }))
    .filter((p) => p.text !== '');
}

/** Text with the search's matching words in <mark>; built from strings, never from HTML. */
export function Highlighted({ text, terms }: { text: string; terms: string[] }) {
  return (
    <>
      {splitByTerms(text, terms).map((part, i) =>
        part.match ? (
          <mark key={i} className="rounded-sm bg-brass/25 px-0.5 text-ink">
            {part.text}
          </mark>
        ) : (
          <span key={i}>{part.text}</span>
        ),
      )}
    </>
  );
}
