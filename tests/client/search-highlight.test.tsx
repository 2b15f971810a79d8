import { render } from '@testing-library/react';
import { describe, expect, it } from 'vitest';
import { Highlighted, splitByTerms } from '@/features/courses/components/highlight';

describe('search highlighting', () => {
  it('when the matched words appear in any letter case, then exactly those whole words are marked', () => {
    const parts = splitByTerms('Broaches and a broach; broaching is not reproached.', ['broach', 'broaches']);
    expect(parts.filter((p) => p.match).map((p) => p.text)).toEqual(['Broaches', 'broach']);
    expect(parts.map((p) => p.text).join('')).toBe('Broaches and a broach; broaching is not reproached.');
  });

  it('when there are no terms, then the text comes back whole and unmarked', () => {
    expect(splitByTerms('quench oil', [])).toEqual([{ text: 'quench oil', match: false }]);
  });

  it('when the snippet holds markup-like text, then it is shown as text inside <mark>, never parsed', () => {
    const { container } = render(<Highlighted text={'<b>oil</b> & <img src=x onerror=alert(1)>'} terms={['oil']} />);
    expect(container.querySelector('b')).toBeNull();
    expect(container.querySelector('img')).toBeNull();
    expect([...container.querySelectorAll('mark')].map((m) => m.textContent)).toEqual(['oil']);
    expect(container.textContent).toBe('<b>oil</b> & <img src=x onerror=alert(1)>');
  });
});
