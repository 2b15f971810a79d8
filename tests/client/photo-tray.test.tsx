import { fireEvent, render, screen, waitFor } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { useEffect } from 'react';
import { beforeEach, describe, expect, it, vi } from 'vitest';
import { ApiError } from '@/lib/api-client';
import { PhotoTray } from '@/features/submissions/components/photo-tray';
import { usePhotoTray } from '@/features/submissions/components/use-photo-tray';

const upload = vi.hoisted(() => vi.fn());
vi.mock('@/features/submissions/api/upload-photo', () => ({ uploadPhoto: upload }));
vi.mock('sonner', () => ({ toast: { warning: vi.fn() } }));

const stored = (uploadId: number, caption: string, position: number) => ({
  uploadId,
  caption,
  position,
  width: 800,
  height: 600,
  url: `/api/uploads/${uploadId}`,
  viewUrl: `/api/uploads/${uploadId}?size=view`,
  thumbUrl: `/api/uploads/${uploadId}?size=thumb`,
});

type Ready = { uploadId: number; caption: string }[];
let ready: Ready = [];
const report = (r: Ready) => {
  ready = r;
};
function Tray({ initial = [] as ReturnType<typeof stored>[] }) {
  const tray = usePhotoTray(initial);
  useEffect(() => report(tray.ready));
  return <PhotoTray tray={tray} />;
}

beforeEach(() => {
  upload.mockReset();
  ready = [];
  URL.createObjectURL = vi.fn(() => 'blob:photo');
  URL.revokeObjectURL = vi.fn();
});

describe('photo tray', () => {
  it('when an upload fails, then only that photo shows the error and retrying it alone succeeds', async () => {
    let finish: (v: unknown) => void = () => undefined;
    upload
      .mockImplementationOnce((_file: File, onProgress: (f: number) => void) => {
        onProgress(0.4);
        return new Promise((resolve) => (finish = resolve));
      })
      .mockRejectedValueOnce(
        new ApiError(415, 'UNSUPPORTED_TYPE', 'Only photographs in JPEG, PNG or WebP can be uploaded.'),
      )
      .mockResolvedValueOnce({ id: 22, width: 800, height: 600, url: '', viewUrl: '', thumbUrl: '' });
    render(<Tray />);
    const files = [
      new File(['a'], 'front.jpg', { type: 'image/jpeg' }),
      new File(['b'], 'notes.jpg', { type: 'image/jpeg' }),
    ];
    fireEvent.change(screen.getByLabelText('Add photos'), { target: { files } });

    expect(await screen.findByRole('progressbar', { name: 'Uploading photo 1' })).toHaveAttribute(
      'aria-valuenow',
      '40',
    );
    expect(await screen.findByText('Only photographs in JPEG, PNG or WebP can be uploaded.')).toBeInTheDocument();
    finish({ id: 21, width: 800, height: 600, url: '', viewUrl: '', thumbUrl: '' });
    await waitFor(() => expect(screen.queryByRole('progressbar')).not.toBeInTheDocument());
    expect(ready).toEqual([{ uploadId: 21, caption: '' }]);

    await userEvent.click(screen.getByRole('button', { name: 'Retry photo 2' }));
    await waitFor(() =>
      expect(ready).toEqual([
        { uploadId: 21, caption: '' },
        { uploadId: 22, caption: '' },
      ]),
    );
    expect(upload).toHaveBeenCalledTimes(3);
    expect(upload.mock.calls[2][0]).toBe(files[1]);
  });

  it('when photos are moved with the keyboard and one removed, then the order follows and focus stays on the moved photo', async () => {
    render(
      <Tray initial={[stored(1, 'Front face', 1), stored(2, 'Oil sink', 2), stored(3, 'Against the square', 3)]} />,
    );
    const down = screen.getByRole('button', { name: 'Move photo 1 down' });
    down.focus();
    await userEvent.keyboard('{Enter}');
    expect(ready.map((p) => p.caption)).toEqual(['Oil sink', 'Front face', 'Against the square']);
    await waitFor(() => expect(screen.getByRole('button', { name: 'Move photo 2 down' })).toHaveFocus());
    expect(screen.getByText('Photo moved to position 2 of 3.')).toBeInTheDocument();
    expect(screen.getByRole('button', { name: 'Move photo 1 up' })).toBeDisabled();
    await userEvent.click(screen.getByRole('button', { name: 'Remove photo 3' }));
    expect(ready.map((p) => p.uploadId)).toEqual([2, 1]);
  });

  it('when captions are typed, then they travel with their photo', async () => {
    render(<Tray initial={[stored(5, '', 1)]} />);
    await userEvent.type(screen.getByLabelText('Caption for photo 1'), 'Arbor upright');
    expect(ready).toEqual([{ uploadId: 5, caption: 'Arbor upright' }]);
  });
});
