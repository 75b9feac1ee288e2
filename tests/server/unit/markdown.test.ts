// Lesson prompts: Markdown rendered by marked and sanitised by sanitize-html. The attacks
// are the usual ones (OWASP XSS Filter Evasion cheat sheet): script tags, event-handler
// attributes, javascript: URLs in any letter case, data: URLs and embedded frames.
import { describe, expect, it } from 'vitest';
import { renderPrompt } from '../../../server/services/markdown';

describe('lesson prompts', () => {
  it('keep the teacher’s Markdown', () => {
    const html = renderPrompt(
      'Why does **95 %** control fail?\n\n- seed rain\n- *dormancy*\n\n[notes](https://example.org/a)',
    );
    expect(html).toContain('<strong>95 %</strong>');
    expect(html).toContain('<li><em>dormancy</em></li>');
    expect(html).toContain('<a href="https://example.org/a" rel="noopener noreferrer nofollow">notes</a>');
  });

  it('drop scripts, event handlers, javascript: and data: links and frames', () => {
    const attacks = [
      '<script>alert(1)</script>',
      '<img src=x onerror="alert(1)">',
      '[click](javascript:alert(1))',
      '<a href="JaVaScRiPt:alert(1)">x</a>',
      '[d](data:text/html;base64,PHNjcmlwdD5hbGVydCgxKTwvc2NyaXB0Pg==)',
      '<iframe src="https://example.org"></iframe>',
      '<p onclick="alert(1)">p</p>',
      '<svg><script>alert(1)</script></svg>',
    ];
    for (const attack of attacks) {
      const html = renderPrompt(`Before ${attack} after`);
      expect(html).not.toMatch(/<script|onerror|onclick|javascript:|data:|<iframe|<svg|<img/i);
      expect(html).toContain('after');
    }
  });

  it('turn the page’s own heading levels into prompt headings', () => {
    expect(renderPrompt('# Big')).toBe('<h3>Big</h3>\n');
  });
});
