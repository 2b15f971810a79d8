import { Check, Circle } from 'lucide-react';
import { toast } from 'sonner';
import { Button } from '@/components/ui/button';
import { useMarkLessonDone } from '../api/mark-lesson-done';

/** A toggle: pressed when the apprentice has marked the lesson done. */
export function MarkDoneButton({ lessonId, done }: { lessonId: number; done: boolean }) {
  const mark = useMarkLessonDone();
  const toggle = () =>
    mark.mutate({ lessonId, done: !done }, { onError: (err) => toast.error(`The mark was not saved: ${err.message}`) });
  return (
    <div className="flex items-center gap-3">
      <Button
        variant={done ? 'secondary' : 'primary'}
        aria-pressed={done}
        busy={mark.isPending}
        onClick={toggle}
        className={done ? 'border-passed text-passed' : ''}
      >
        {done ? <Check className="size-4" aria-hidden /> : <Circle className="size-4" aria-hidden />}
        Mark as done
      </Button>
      <span aria-live="polite" className="text-sm text-muted">
        {done ? 'Done. Press again to mark it as not done.' : ''}
      </span>
    </div>
  );
}
