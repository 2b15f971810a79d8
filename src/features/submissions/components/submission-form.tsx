import { Save, Send } from 'lucide-react';
import { useEffect, useState } from 'react';
import { useQueryClient } from '@tanstack/react-query';
import { useNavigate } from 'react-router-dom';
import { toast } from 'sonner';
import type { LinkedRecord, SubmissionPhotoDTO } from '@shared/schemas/submission';
import { Button } from '@/components/ui/button';
import { MarkdownField } from '@/components/ui/markdown-field';
import { ErrorNotice } from '@/components/ui/states';
import { paths } from '@/config/paths';
import { useSaveAndSend, useSaveDraft } from '../api/save-submission';
import { submissionKeys } from '../api/submission-keys';
import { LinkPicker } from './link-picker';
import { PhotoTray } from './photo-tray';
import { usePhotoTray } from './use-photo-tray';

interface DraftStart {
  notes: string;
  photos: SubmissionPhotoDTO[];
  logEntries: LinkedRecord[];
  calculations: LinkedRecord[];
}

interface Props {
  projectId: number;
  /** Null until the first save creates the piece. */
  submissionId: number | null;
  start: DraftStart;
  versionNumber: number;
}

/** Photos, notes and links of one version of a piece; save it as a draft or send it for review. */
export function SubmissionForm({ projectId, submissionId, start, versionNumber }: Props) {
  const navigate = useNavigate();
  const client = useQueryClient();
  const tray = usePhotoTray(start.photos);
  const [notes, setNotes] = useState(start.notes);
  const [links, setLinks] = useState({
    logEntryIds: start.logEntries.map((r) => r.id),
    calculationIds: start.calculations.map((r) => r.id),
  });
  const [dirty, setDirty] = useState(false);
  const save = useSaveDraft();
  const send = useSaveAndSend();

  useEffect(() => {
    if (!dirty) return;
    const warn = (e: BeforeUnloadEvent) => e.preventDefault();
    window.addEventListener('beforeunload', warn);
    return () => window.removeEventListener('beforeunload', warn);
  }, [dirty]);

  const draft = () => ({ notes, photos: tray.ready, ...links });
  const blocked = tray.uploading
    ? 'Wait for the photos to finish uploading.'
    : tray.failed
      ? 'Retry or remove the photo that failed first.'
      : null;

  const onSave = () =>
    save.mutate(
      { id: submissionId, projectId, draft: draft() },
      {
        onSuccess: (saved) => {
          setDirty(false);
          toast.success('Draft saved.');
          if (submissionId === null) navigate(paths.editSubmission(saved.id), { replace: true });
        },
      },
    );

  const onSend = () =>
    send.mutate(
      { id: submissionId, projectId, draft: draft() },
      {
        onSuccess: (sent) => {
          setDirty(false);
          toast.success('Sent for review. Your mentor has been told.');
          client.setQueryData(submissionKeys.detail(sent.id), sent);
          navigate(paths.submission(sent.id));
        },
      },
    );

  return (
    <form
      className="space-y-6"
      onChange={() => setDirty(true)}
      onSubmit={(e) => {
        e.preventDefault();
        onSend();
      }}
    >
      <PhotoTray tray={tray} />
      <MarkdownField
        label="Notes for your mentor"
        value={notes}
        onChange={(v) => {
          setNotes(v);
          setDirty(true);
        }}
        rows={7}
        maxLength={20_000}
        hint="Markdown: **bold**, lists with -, tables. Say what you measured, what went wrong and what you changed."
      />
      <LinkPicker
        {...links}
        linked={{ logEntries: start.logEntries, calculations: start.calculations }}
        onChange={(next) => {
          setLinks(next);
          setDirty(true);
        }}
      />
      {(save.error || send.error) && <ErrorNotice error={save.error ?? send.error} title="The piece was not saved" />}
      <div className="flex flex-wrap items-center gap-3 border-t border-rule pt-4">
        <Button
          type="submit"
          busy={send.isPending}
          disabled={Boolean(blocked) || tray.ready.length === 0 || save.isPending}
        >
          <Send className="size-4" aria-hidden />
          Send version {versionNumber} for review
        </Button>
        <Button
          variant="secondary"
          onClick={onSave}
          busy={save.isPending}
          disabled={Boolean(blocked) || send.isPending}
        >
          <Save className="size-4" aria-hidden />
          Save draft
        </Button>
        <p className="text-sm text-muted" aria-live="polite">
          {blocked ??
            (tray.ready.length === 0
              ? 'Add at least one photo to send.'
              : 'Once sent, the piece waits for review and cannot be changed.')}
        </p>
      </div>
    </form>
  );
}
