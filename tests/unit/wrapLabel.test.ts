import { describe, expect, it } from 'vitest';
import { wrapLabel } from '../../src/utils/wrapLabel.js';

describe('labels wrapped for drawings', () => {
  it('break at spaces into lines instead of cutting the text', () => {
    expect(wrapLabel('Stripping (3.6 m bottom)', 14, 3)).toEqual(['Stripping (3.6', 'm bottom)']);
    expect(wrapLabel('Flash zone below the wash', 15, 2)).toEqual(['Flash zone', 'below the wash']);
    expect(wrapLabel('Top PA', 10, 2)).toEqual(['Top PA']);
  });

  it('shorten only what does not fit in the lines allowed', () => {
    expect(wrapLabel('Middle (kero / diesel) with a long remark', 14, 2)).toEqual(['Middle (kero /', 'diesel) with…']);
    expect(wrapLabel('Supercalifragilistic', 10, 1)).toEqual(['Supercali…']);
  });
});
