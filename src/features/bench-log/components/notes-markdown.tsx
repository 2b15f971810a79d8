import Markdown from 'react-markdown';
import remarkGfm from 'remark-gfm';

/** An apprentice's notes as Markdown; raw HTML in them is shown as text, never run. */
export function NotesMarkdown({ text }: { text: string }) {
  if (!text.trim()) return <p className="text-muted">No notes.</p>;
  return (
    <div className="prose max-w-prose prose-headings:font-serif">
      <Markdown remarkPlugins={[remarkGfm]} skipHtml>
        {text}
      </Markdown>
    </div>
  );
}
