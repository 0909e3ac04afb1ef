import { describe, expect, it } from 'vitest';
import { validate } from '../../server/http/validation.js';
import { textFault, withTextRules } from '../../server/http/textRules.js';
import { ValidationError } from '../../server/errors.js';

describe('text rules', () => {
  it('single-line text refuses every control character; multi-line text allows tab, LF and CR', () => {
    for (const s of ['a\u0000', '\u0001', 'a\tb', 'a\nb', 'a\rb', '\u007f', '\u0085'])
      expect(textFault(s, false), JSON.stringify(s)).toMatch(/control/);
    for (const s of ['a\tb', 'a\r\nb', 'plain ünïcödé 😀']) expect(textFault(s, true), JSON.stringify(s)).toBeNull();
    for (const s of ['a\u0000', '\u000b', '\u001b[31m']) expect(textFault(s, true), JSON.stringify(s)).toMatch(/control/);
  });

  it('lone surrogates are refused; a surrogate pair is fine', () => {
    expect(textFault('\ud800', true)).toMatch(/surrogate/);
    expect(textFault('x\udc00', false)).toMatch(/surrogate/);
    expect(textFault('\ud83d\ude00', false)).toBeNull();
  });

  it('withTextRules marks every string schema, nested ones too, except enums and those already marked', () => {
    const s = withTextRules({
      type: 'object',
      properties: {
        a: { type: 'string' },
        b: { type: 'array', items: { type: 'string' } },
        c: { type: 'string', enum: ['x'] },
        d: { type: 'string', 'x-text': 'multiline' },
      },
    });
    expect(s.properties.a).toEqual({ type: 'string', 'x-text': 'line' });
    expect(s.properties.b.items).toEqual({ type: 'string', 'x-text': 'line' });
    expect(s.properties.c).toEqual({ type: 'string', enum: ['x'] });
    expect(s.properties.d['x-text']).toBe('multiline');
  });

  it('validate names the field; uuids have no urn: prefix; coerced query numbers must be finite', () => {
    const schema = {
      type: 'object',
      properties: { name: { type: 'string' }, id: { type: 'string', format: 'uuid' }, n: { type: 'integer' } },
    };
    const fault = (data: object, where = 'body') => {
      try {
        validate(schema, data, where);
        return null;
      } catch (e) {
        return (e as ValidationError).details;
      }
    };
    expect(fault({ name: 'a\u0000b' })).toEqual([{ path: 'name', message: expect.stringMatching(/control characters/) }]);
    expect(fault({ id: 'urn:uuid:00000000-0000-4000-8000-000000000000' })?.[0]?.path).toBe('id');
    expect(fault({ id: '00000000-0000-4000-8000-000000000000' })).toBeNull();
    expect(fault({ n: 'Infinity' }, 'query')).toEqual([{ path: 'n', message: 'must be a finite number' }]);
    expect(fault({ n: '12' }, 'query')).toBeNull();
  });
});
