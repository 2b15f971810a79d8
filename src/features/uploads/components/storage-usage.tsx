import { ErrorNotice, Loading, ProgressBar } from '@/components/ui/states';
import { useStorageUsage } from '../api/get-storage-usage';

const MB = 1024 * 1024;
/** Megabytes with one decimal below 10 MB, whole above: "0.4 MB", "37 MB", "500 MB". */
const formatMegabytes = (bytes: number) => {
  const mb = bytes / MB;
  return `${mb < 10 ? mb.toFixed(1) : Math.round(mb)} MB`;
};

/** How much of the person's photo storage their photos fill, and what happens when it is full. */
export function StorageUsage() {
  const usage = useStorageUsage();
  if (usage.isPending) return <Loading label="Loading your photo storage…" />;
  if (usage.isError) return <ErrorNotice error={usage.error} title="Could not load your photo storage" />;
  const { usedBytes, quotaBytes } = usage.data;
  const full = usedBytes >= quotaBytes;
  return (
    <div className="space-y-2">
      <p>
        <span className="num">{formatMegabytes(usedBytes)}</span> of{' '}
        <span className="num">{formatMegabytes(quotaBytes)}</span> used
      </p>
      <ProgressBar value={usedBytes / quotaBytes} label="Photo storage used" />
      <p className="text-sm text-muted">
        {full
          ? 'Your photo storage is full: new photos cannot be sent. Ask the guild office for more room.'
          : 'Every photo you send to a mentor or keep in your bench log counts, in all the sizes it is kept in.'}
      </p>
    </div>
  );
}
