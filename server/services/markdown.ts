// Lesson prompts are the teacher's Markdown, shown to anyone with the class link. They are
// rendered with marked and then sanitised with sanitize-html against a short allowlist
// (OWASP XSS Prevention cheat sheet: sanitise HTML from users with a library built for
// it), so a script tag, an event handler or a javascript: link never reaches a page.
import { marked } from 'marked';
import sanitizeHtml from 'sanitize-html';

const allowed: sanitizeHtml.IOptions = {
  allowedTags: [
    'p',
    'br',
    'strong',
    'em',
    'del',
    'code',
    'pre',
    'blockquote',
    'ul',
    'ol',
    'li',
    'a',
    'h3',
    'h4',
    'hr',
  ],
  allowedAttributes: { a: ['href', 'title', 'rel'], ol: ['start'] },
  allowedSchemes: ['http', 'https', 'mailto'],
  allowProtocolRelative: false,
  // What is not allowed is dropped with its content for scripts and styles, kept as text otherwise.
  disallowedTagsMode: 'discard',
  transformTags: {
    // The lesson page owns the h1 and h2; a prompt's headings sit below them.
    h1: 'h3',
    h2: 'h3',
    h5: 'h4',
    h6: 'h4',
    a: sanitizeHtml.simpleTransform('a', { rel: 'noopener noreferrer nofollow' }),
  },
};

export function renderPrompt(markdown: string): string {
  const html = marked.parse(markdown, { async: false, gfm: true, breaks: true });
  return sanitizeHtml(html, allowed);
}
