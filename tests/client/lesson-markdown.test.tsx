import { QueryClient, QueryClientProvider } from '@tanstack/react-query';
import { render, screen, within } from '@testing-library/react';
import type { ReactNode } from 'react';
import { MemoryRouter } from 'react-router-dom';
import { describe, expect, it } from 'vitest';
import { LessonMarkdown } from '@/features/courses/components/lesson-markdown';

function renderLesson(body: string) {
  const client = new QueryClient({ defaultOptions: { queries: { retry: false } } });
  const wrap = (children: ReactNode) => (
    <QueryClientProvider client={client}>
      <MemoryRouter>{children}</MemoryRouter>
    </QueryClientProvider>
  );
  return render(wrap(<LessonMarkdown body={body} courseSlug="going-train-wall-regulator" />));
}

describe('lesson markdown', () => {
  it('when a body holds a caution block, then it renders as a note headed "Caution" with its text', () => {
    renderLesson(':::caution\nBroaches are **sharp**: keep your fingers clear.\n:::\n');
    const note = screen.getByRole('note', { name: 'Caution' });
    expect(within(note).getByText('sharp')).toBeInTheDocument();
    expect(note).toHaveTextContent('Broaches are sharp: keep your fingers clear.');
  });

  it('when a body holds raw HTML, then no element is made from it', () => {
    const { container } = renderLesson(
      'Before <b id="raw">bold</b> after.\n\n<script>window.hacked = true</script>\n\n<div class="x">block</div>\n',
    );
    expect(container.querySelector('#raw')).toBeNull();
    expect(container.querySelector('script')).toBeNull();
    expect(container.querySelector('div.x')).toBeNull();
    expect((window as { hacked?: boolean }).hacked).toBeUndefined();
  });

  it('when a body embeds a calculator, then a placeholder shows at once and the live widget replaces it', async () => {
    renderLesson('Work out the depth:\n\n::calculator{name="broach-taper"}\n\nThen cut.');
    expect(screen.getByRole('status')).toHaveTextContent('Loading the broach taper calculator');
    expect(await screen.findByText('Broach taper calculator', {}, { timeout: 15_000 })).toBeInTheDocument();
    expect(screen.queryByText(/Loading the broach taper calculator/)).toBeNull();
  }, 20_000);

  it('when headings repeat, then each gets a unique id from its text', () => {
    renderLesson('## The tools\n\ntext\n\n### Side shake\n\n## The tools\n');
    const ids = screen.getAllByRole('heading').map((h) => h.id);
    expect(ids).toEqual(['the-tools', 'side-shake', 'the-tools-1']);
  });

  it('when a lone image has a title, then it is a figure with that caption from the course images route', () => {
    renderLesson('![Section through a plate](images/hole-taper.svg "The taper a broach leaves")\n');
    const figure = screen.getByRole('figure');
    const img = within(figure).getByRole('img', { name: 'Section through a plate' });
    expect(img).toHaveAttribute('src', '/api/content/going-train-wall-regulator/images/hole-taper.svg');
    expect(figure.querySelector('figcaption')).toHaveTextContent('The taper a broach leaves');
  });

  it('when a body has a table and a footnote, then both render, the note under "Sources and notes"', () => {
    renderLesson(
      '| Pivot | Hole |\n|---|---|\n| 1.00 mm | 1.02 mm |\n\nA claim.[^src]\n\n[^src]: A trade reference.\n',
    );
    expect(screen.getByRole('table')).toHaveTextContent('1.02 mm');
    expect(screen.getByRole('heading', { name: 'Sources and notes' })).toBeInTheDocument();
    expect(screen.getByText('A trade reference.')).toBeInTheDocument();
  });
});
