import { describe, expect, it } from 'vitest';
import { withoutRepeatedTitle } from './notes-title';

const titles = ['Safety notes', 'Safety'];

describe('withoutRepeatedTitle', () => {
  it('drops a first heading that repeats the panel title, in either heading style (CommonMark §4.2, §4.3)', () => {
    expect(withoutRepeatedTitle('# Safety notes\n\nKeep the guard on.\n', titles)).toBe('Keep the guard on.\n');
    expect(withoutRepeatedTitle('## safety:\nKeep the guard on.', titles)).toBe('Keep the guard on.');
    expect(withoutRepeatedTitle('Safety notes\n============\n\nUnplug first.', titles)).toBe('Unplug first.');
    expect(withoutRepeatedTitle('# Safety notes #\nUnplug first.', titles)).toBe('Unplug first.');
  });

  it('keeps any other first heading, and headings further down', () => {
    expect(withoutRepeatedTitle('# Before you cut\n\nUnplug first.', titles)).toBe('# Before you cut\n\nUnplug first.');
    expect(withoutRepeatedTitle('Unplug first.\n\n# Safety notes\n', titles)).toBe('Unplug first.\n\n# Safety notes\n');
    expect(withoutRepeatedTitle('#Safety notes', titles)).toBe('#Safety notes');
  });
});
