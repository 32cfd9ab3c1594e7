import { createHash } from 'node:crypto';
import { CAUTION_LEVELS, type CautionLevel, type SafetyTopic } from '../engine/safety-topics';

/**
 * A static first paint for the public guide pages: the studio's index.html with the page's title, workshop,
 * cautions and poster already in `<div id="root">`, so a reader on a slow phone sees them before the JavaScript
 * arrives (the studio takes the shell away once its own view has the guide). Only plain-text fields are used,
 * every one escaped; the guide's rich text (summary, step bodies) never reaches the shell.
 */
export interface PageShell {
  /** The document's <title>. */
  title: string;
  description: string;
  /** HTML for inside #root, built from escaped text only. */
  body: string;
}

/** The parts of the follow-along answer the shell shows. */
export interface GuideShellSource {
  workshop: { name: string };
  guide: { title: string; buildTitle: string };
  cautions: { topic: SafetyTopic | string; level: CautionLevel | string; text: string }[];
  disclaimer: string;
  footage: { posterUrl: string | null } | null;
  steps: { position: number; title: string; caution: { level: CautionLevel | string; text: string } | null }[];
}

/** The parts of a guide index item the shell shows. */
export interface GuideIndexShellItem {
  title: string;
  path: string;
  workshop: { name: string };
  buildTitle: string;
}

/** The studio's names of the safety topics (features/guide-view/components/cautions.ts says the same). */
const TOPIC_NAMES: Record<string, string> = {
  lifting: 'Lifting the vehicle',
  rotating_parts: 'Rotating parts',
  high_voltage: 'High voltage',
  welding: 'Welding',
  pressing: 'Pressing',
};

const HTML_ESCAPES: Record<string, string> = { '&': '&amp;', '<': '&lt;', '>': '&gt;', '"': '&quot;', "'": '&#39;' };

/** Text for an element's content or a quoted attribute. */
export function escapeHtml(text: string): string {
  return text.replace(/[&<>"']/g, (character) => HTML_ESCAPES[character]);
}

/**
 * Enough of the app's layout (a 56 px header, the 230 px navigation from 48em, Mantine's lg padding) that the
 * title and cautions sit where the studio draws them, so nothing jumps when it takes over.
 */
const SHELL_STYLE = `<style>
.fw-shell{font-family:-apple-system,BlinkMacSystemFont,"Segoe UI",Roboto,Helvetica,Arial,sans-serif;color:#212529;line-height:1.55}
.fw-shell-header{height:56px;box-sizing:border-box;display:flex;align-items:center;gap:8px;padding:0 16px;border-bottom:1px solid #dee2e6;font-weight:600;font-size:18px}
.fw-shell-main{padding:20px;max-width:1200px}
@media (min-width:48em){.fw-shell-main{margin-left:230px}}
.fw-shell h1{font-size:34px;line-height:1.3;margin:0 0 4px}
.fw-shell-meta{font-size:14px;color:#868e96;margin:0 0 16px}
.fw-shell-safety h2{font-size:18px;margin:0 0 6px}
.fw-shell-cautions{list-style:none;margin:0 0 6px;padding:0;display:grid;gap:4px}
.fw-shell-cautions li{border:1px solid #dee2e6;border-radius:4px;padding:6px 10px;font-size:14px}
.fw-shell-word{font-weight:700;margin-right:6px}
.fw-shell-word[data-level=DANGER]{color:#c92a2a}.fw-shell-word[data-level=WARNING]{color:#d9480f}
.fw-shell-word[data-level=CAUTION]{color:#a77b00}.fw-shell-word[data-level=NOTICE]{color:#1864ab}
.fw-shell-note{font-size:12px;color:#868e96;margin:0 0 16px}
.fw-shell-poster{display:block;width:100%;max-width:960px;aspect-ratio:16/9;object-fit:contain;background:#000;border-radius:4px}
.fw-shell-list{list-style:none;padding:0;margin:0;display:grid;gap:8px}
.fw-shell-list a{font-weight:600;color:#1c7ed6;text-decoration:none}
.fw-shell-card{max-width:480px;margin:20px auto 0;border:1px solid #dee2e6;border-radius:8px;padding:32px}
.fw-shell-card h1{font-size:26px}
.fw-shell-lead{color:#495057;margin:0}
</style>`;

function frame(main: string): string {
  return (
    `<div data-page-shell="" class="fw-shell">${SHELL_STYLE}` +
    `<header class="fw-shell-header"><img src="/favicon.svg" alt="" width="28" height="28" />Fitwright</header>` +
    `<main class="fw-shell-main">${main}</main></div>`
  );
}

interface ShellCaution {
  level: string;
  text: string;
  source: string;
}

/** Every caution, most severe first, topics before steps within a level (as the studio's cautions block orders them). */
function orderedCautions(source: GuideShellSource): ShellCaution[] {
  const items: ShellCaution[] = [
    ...source.cautions.map((caution) => ({ level: caution.level, text: caution.text, source: TOPIC_NAMES[caution.topic] ?? caution.topic })),
    ...[...source.steps]
      .sort((a, b) => a.position - b.position)
      .flatMap((step) => (step.caution ? [{ level: step.caution.level, text: step.caution.text, source: `Step ${step.position}: ${step.title}` }] : [])),
  ];
  const rank = (level: string) => {
    const found = (CAUTION_LEVELS as readonly string[]).indexOf(level);
    return found === -1 ? CAUTION_LEVELS.length : found;
  };
  return items.sort((a, b) => rank(a.level) - rank(b.level));
}

/** The follow-along page: title, workshop and build, the cautions (the most severe level in full, the others by heading), poster. */
export function guidePageShell(source: GuideShellSource): PageShell {
  const cautions = orderedCautions(source);
  const mostSevere = cautions[0]?.level;
  const cautionItems = cautions
    .map((caution) => {
      const word = `<span class="fw-shell-word" data-level="${escapeHtml(caution.level)}">⚠ ${escapeHtml(caution.level)}</span>`;
      const text = caution.level === mostSevere ? ` ${escapeHtml(caution.text)}` : '';
      return `<li>${word}<strong>${escapeHtml(caution.source)}</strong>${text}</li>`;
    })
    .join('');
  const poster = source.footage?.posterUrl
    ? `<img class="fw-shell-poster" src="${escapeHtml(source.footage.posterUrl)}" alt="Poster frame of the guide’s video" width="960" height="540" fetchpriority="high" />`
    : '';
  const main =
    `<h1>${escapeHtml(source.guide.title)}</h1>` +
    `<p class="fw-shell-meta">${escapeHtml(source.workshop.name)} · ${escapeHtml(source.guide.buildTitle)}</p>` +
    `<section class="fw-shell-safety" aria-labelledby="fw-shell-safety"><h2 id="fw-shell-safety">Safety before you start</h2>` +
    (cautionItems ? `<ul class="fw-shell-cautions">${cautionItems}</ul>` : '') +
    `<p class="fw-shell-note">${escapeHtml(source.disclaimer)}</p></section>` +
    poster;
  return {
    title: `${source.guide.title} · ${source.workshop.name} · Fitwright`,
    description: `A verified-fit build guide from ${source.workshop.name}: ${source.guide.title} (${source.guide.buildTitle}).`,
    body: frame(main),
  };
}

/** The guide index: the published guides' titles as links. */
export function guideIndexShell(items: GuideIndexShellItem[]): PageShell {
  const list = items
    .map(
      (item) =>
        `<li><a href="${escapeHtml(item.path)}">${escapeHtml(item.title)}</a>` +
        `<div class="fw-shell-meta">${escapeHtml(item.workshop.name)} · ${escapeHtml(item.buildTitle)}</div></li>`,
    )
    .join('');
  return {
    title: 'Published guides · Fitwright',
    description: 'Verified-fit build guides published by workshops on Fitwright.',
    body: frame(`<h1>Published guides</h1><ul class="fw-shell-list">${list}</ul>`),
  };
}

/** The public pages without data of their own: a title and a sentence, so nothing is blank before the JavaScript. */
export type StaticShellName = 'unsubscribe' | 'mail-preferences' | 'fit-finder';

const STATIC_SHELLS: Record<StaticShellName, { title: string; description: string; lead: string; card: boolean }> = {
  unsubscribe: {
    title: 'Stop fit news',
    description: 'Stop the fit news an e-mail from Fitwright brought you.',
    lead: 'This page stops the fit news of the e-mail you came from, and says what it stopped as soon as it has loaded.',
    card: true,
  },
  'mail-preferences': {
    title: 'Mail preferences',
    description: 'Choose which mail Fitwright sends you.',
    lead: 'Choose which mail Fitwright sends you. Your settings show as soon as the page has loaded.',
    card: true,
  },
  'fit-finder': {
    title: 'Fit finder',
    description: 'Has anyone proven it fits? Search every published guide for assemblies whose fit checks match by the numbers.',
    // The studio's own lead (features/fit-finder/components/fit-finder-page.tsx), so nothing moves when it takes over.
    lead:
      'Has anyone proven it fits? Describe what you have; the finder looks through every published guide for assemblies whose fit checks ' +
      'match by the numbers (tooth count and pitch, ISO 286 limits, clearances, length windows), proven ones first.',
    card: false,
  },
};

export function staticPageShell(name: StaticShellName): PageShell {
  const page = STATIC_SHELLS[name];
  const content = `<h1>${escapeHtml(page.title)}</h1><p class="fw-shell-lead">${escapeHtml(page.lead)}</p>`;
  return {
    title: `${page.title} · Fitwright`,
    description: page.description,
    body: frame(page.card ? `<div class="fw-shell-card">${content}</div>` : content),
  };
}

/**
 * Starts the studio's JavaScript once the shell has painted (the frame after it was parsed), or after a second
 * at the latest (a background tab draws no frames). Sent with the page, the entry script and its module preloads
 * (about 190 KB) take a slow link's bandwidth from the page and its poster and can run before the first paint.
 * The script is fixed text (the file names are read from the JSON block beside it), so one CSP hash allows it.
 */
const SHELL_LOADER =
  '(function(){var d=document.getElementById("fw-shell-modules");if(!d)return;var m=JSON.parse(d.textContent),s=0;' +
  'function go(){if(s)return;s=1;m.preload.forEach(function(h){var l=document.createElement("link");l.rel="modulepreload";' +
  'l.crossOrigin="";l.href=h;document.head.appendChild(l)});var e=document.createElement("script");e.type="module";' +
  'e.crossOrigin="";e.src=m.entry;document.head.appendChild(e)}' +
  'requestAnimationFrame(function(){setTimeout(go,0)});setTimeout(go,1000)})();';

/** The Content-Security-Policy source that allows the shell's loader, and nothing else inline. */
export const PAGE_SHELL_SCRIPT_SOURCE = `'sha256-${createHash('sha256').update(SHELL_LOADER).digest('base64')}'`;

const MODULE_SCRIPT = /<script type="module"[^>]*\ssrc="([^"]+)"[^>]*><\/script>\s*/g;
const MODULE_PRELOAD = /<link rel="modulepreload"[^>]*\shref="([^"]+)"[^>]*>\s*/g;

/** The page's module entry and preloads taken out of <head>, and the loader that adds them after the first paint. */
function deferModules(html: string): { html: string; loader: string } {
  const entries = [...html.matchAll(MODULE_SCRIPT)].map((match) => match[1]);
  // Only the shape Vite writes (one entry) is deferred; anything else is left to load as written.
  if (entries.length !== 1) return { html, loader: '' };
  const preload = [...html.matchAll(MODULE_PRELOAD)].map((match) => match[1]);
  // In a <script> block only "</" could end it early; the names are Vite's hashed paths, escaped all the same.
  const modules = JSON.stringify({ entry: entries[0], preload }).replace(/</g, '\\u003c');
  return {
    html: html.replace(MODULE_SCRIPT, '').replace(MODULE_PRELOAD, ''),
    loader: `<script type="application/json" id="fw-shell-modules">${modules}</script><script>${SHELL_LOADER}</script>`,
  };
}

/**
 * The studio's index.html with the shell in place: its <title>, its meta description, and its body in #root.
 * A page built without those landmarks is returned unchanged rather than guessed at.
 */
export function withPageShell(indexHtml: string, shell: PageShell): string {
  const root = '<div id="root"></div>';
  if (!indexHtml.includes(root)) return indexHtml;
  const { html, loader } = deferModules(indexHtml);
  // The studio's stylesheets load as print sheets, which hold back no first paint: the shell, styled inline, paints
  // as soon as the page arrives, not after ~35 KB of CSS. The studio turns them on as it starts
  // (studio/src/lib/page-shell.ts), long before it shows itself. They stay in <head>: the theme's variables are
  // drawn by React inside #root, and a stylesheet after #root would put the library's defaults back over them.
  return html
    .replace(/<link rel="stylesheet"/g, '<link rel="stylesheet" media="print" data-shell-deferred=""')
    .replace(/<title>[^<]*<\/title>/, () => `<title>${escapeHtml(shell.title)}</title>`)
    .replace(/<meta name="description" content="[^"]*"\s*\/?>/, () => `<meta name="description" content="${escapeHtml(shell.description)}" />`)
    .replace(root, () => `<div id="root">${shell.body}</div>${loader}`);
}

/** The public page a studio path names, if it has a shell: the guide index (without a search), one guide, or a static page. */
export type ShellPage =
  | { kind: 'index' }
  | { kind: 'guide'; workshopSlug: string; guideSlug: string }
  | { kind: 'static'; name: StaticShellName };

const STATIC_PATHS = new Map<string, StaticShellName>([
  ['/unsubscribe', 'unsubscribe'],
  ['/mail-preferences', 'mail-preferences'],
  ['/fit-finder', 'fit-finder'],
]);

export function shellPageOf(path: string, query: Record<string, unknown>): ShellPage | null {
  const staticName = STATIC_PATHS.get(path.replace(/(.)\/$/, '$1'));
  if (staticName) return { kind: 'static', name: staticName };
  if (/^\/guides\/?$/.test(path)) return query.q ? null : { kind: 'index' };
  const match = /^\/guides\/([^/]+)\/([^/]+)\/?$/.exec(path);
  if (!match) return null;
  try {
    return { kind: 'guide', workshopSlug: decodeURIComponent(match[1]), guideSlug: decodeURIComponent(match[2]) };
  } catch {
    return null; // Malformed percent-encoding: no such guide.
  }
}
