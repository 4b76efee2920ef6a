// The test helper itself must reject what it claims to reject.
import { describe, expect, it } from 'vitest';
import { checkXml } from './xml-check.ts';

describe('checkXml', () => {
  it('reads a small document', () => {
    const r = checkXml('<svg a="1"><g><text x="0">A &amp; B</text><line x1="0"/></g></svg>');
    expect(r.elements.map((e) => e.name)).toEqual(['svg', 'g', 'text', 'line']);
    expect(r.texts).toEqual(['A & B']);
  });
  it.each([
    ['mismatched close', '<svg><g></svg></g>'],
    ['unclosed', '<svg><g></g>'],
    ['unquoted attribute', '<svg a=1></svg>'],
    ['bare ampersand', '<svg><text>A & B</text></svg>'],
    ['two roots', '<svg></svg><svg></svg>'],
  ])('rejects %s', (_name, xml) => {
    expect(() => checkXml(xml)).toThrow();
  });
});
