import Markdown from 'react-markdown';
import remarkGfm from 'remark-gfm';

/** Text people wrote (notes, comments) as Markdown; raw HTML in it is dropped, never run. */
export function UserMarkdown({ text, empty = 'Nothing written.' }: { text: string; empty?: string }) {
  if (!text.trim()) return <p className="text-muted">{empty}</p>;
  return (
    <div className="prose max-w-[70ch] text-ink prose-headings:font-serif prose-p:leading-relaxed">
      <Markdown remarkPlugins={[remarkGfm]} skipHtml>
        {text}
      </Markdown>
    </div>
  );
}
