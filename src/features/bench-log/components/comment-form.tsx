import { useId, useState } from 'react';
import { Button } from '@/components/ui/button';
import { TextArea } from '@/components/ui/field';
import { ErrorNotice } from '@/components/ui/states';
import { useAddFeedback } from '../api/add-feedback';

export function CommentForm({ entryId }: { entryId: number }) {
  const { comment } = useAddFeedback(entryId);
  const [body, setBody] = useState('');
  const headingId = useId();
  return (
    <form
      className="space-y-2"
      aria-labelledby={headingId}
      onSubmit={(e) => {
        e.preventDefault();
        if (body.trim()) comment.mutate({ body }, { onSuccess: () => setBody('') });
      }}
    >
      <h3 id={headingId} className="font-serif text-lg font-semibold">
        Comment on this entry
      </h3>
      <TextArea label="Your comment" rows={3} value={body} onChange={(e) => setBody(e.target.value)} />
      {comment.error && <ErrorNotice error={comment.error} title="The comment was not saved" />}
      <Button type="submit" variant="secondary" busy={comment.isPending} disabled={!body.trim()}>
        Add comment
      </Button>
    </form>
  );
}
