import sanitizeHtml from 'sanitize-html';
import slugify from 'slugify';

/**
 * What the studio's Tiptap editor (StarterKit + Link) produces and a guide may keep. Anything else —
 * scripts, styles, event handlers, images, iframes — is dropped; links open safely in a new tab.
 */
const RICH_TEXT_OPTIONS: sanitizeHtml.IOptions = {
  allowedTags: ['p', 'br', 'strong', 'em', 's', 'u', 'code', 'pre', 'blockquote', 'ul', 'ol', 'li', 'h2', 'h3', 'h4', 'a', 'hr'],
  allowedAttributes: { a: ['href', 'target', 'rel'] },
  allowedSchemes: ['http', 'https', 'mailto'],
  allowProtocolRelative: false,
  disallowedTagsMode: 'discard',
  transformTags: {
    a: sanitizeHtml.simpleTransform('a', { target: '_blank', rel: 'noopener noreferrer nofollow' }),
  },
};

export function sanitizeRichText(html: string): string {
  const clean = sanitizeHtml(html, RICH_TEXT_OPTIONS).trim();
  // An emptied editor sends "<p></p>": store it as no text at all.
  return /^(<p>\s*<\/p>)*$/.test(clean) ? '' : clean;
}

const SLUG_MAX = 100;

/** A URL slug from a title: lower case ASCII words joined by dashes ("guide" when nothing is left). */
export function slugFromTitle(title: string): string {
  const slug = slugify(title, { lower: true, strict: true, trim: true }).slice(0, SLUG_MAX).replace(/-+$/, '');
  return slug || 'guide';
}
