import MarkdownIt from 'markdown-it';
import type { Me } from '@/shared/schemas/auth';
import type { WalkDetail } from '@/shared/schemas/walks';
import { ROLE_LABELS } from '@/shared/roles';
import { activeItem, navItemsFor } from '@/shared/nav-items';
import { navIconShapes, type IconShape } from '@/shared/nav-icon-shapes';
import { BACK_LABEL, CAUTION_DEFER, CAUTION_HEADING, STEP_KIND_WORDS, walkJobLine, walkProgress } from '@/shared/walk-words';
import { colors } from '@/components/theme';
import { HAZARD_LABELS } from '@/trees/tree-format';
import { WALK_SHELL_STYLE } from './walk-first-paint-style';

/**
 * A walk page's first paint: the walk's current step drawn by the server as
 * plain HTML, in the same places as the app draws it (components/nav/
 * app-shell.tsx, components/walk/walk-screen.tsx, step-view.tsx), so a
 * technician on a slow connection reads the cautions and the step while the
 * app's JavaScript is still arriving. It covers the page until the walk
 * screen has drawn the same step (components/boot-shell.ts), and is inert:
 * nothing in it can be pressed or read out (`inert`); the app beneath takes over.
 *
 * Drawn down to the step's text; the answers, the note and the photos appear
 * with the app. tests/e2e/walk-first-paint.test.ts checks the places.
 */
export function walkFirstPaint(me: Me, w: WalkDetail): string {
  const items = navItemsFor(me.role);
  const pathname = `/walks/${w.walk.id}`;
  const current = activeItem(pathname, items);
  const meta = w.doc.machine.states[w.position.stepId]?.meta;
  if (!meta) return '';
  const progress = walkProgress(w.position);
  const navLink = (layout: 'rail' | 'bar') =>
    items
      .map((item) => {
        const active = item === current;
        // As NavLink in components/nav/app-shell.tsx.
        const colour = layout === 'rail' ? (active ? colors.ink : colors.paper) : active ? colors.accentDark : colors.inkMuted;
        return `<div class="wf-${layout}-item${active ? ' wf-active' : ''}">${icon(item.icon, colour)}<div class="wf-t wf-${layout}-label" style="color:${colour}">${esc(item.label)}</div></div>`;
      })
      .join('');
  const cautions = meta.cautions.length
    ? `<div class="wf-caution" data-part="cautions"><div class="wf-t wf-caution-head">${esc(CAUTION_HEADING)}</div>${meta.cautions
        .map((c) => `<div class="wf-caution-item"><div class="wf-t wf-hazard">⚠ ${esc(HAZARD_LABELS[c.hazard])}</div><div class="wf-t wf-caution-text">${esc(c.text)}</div></div>`)
        .join('')}<div class="wf-t wf-small">${esc(CAUTION_DEFER)}</div></div>`
    : '';
  return `<style>${WALK_SHELL_STYLE}</style>
<div id="boot-shell-walk" class="wf" inert>
<div class="wf-root">
<div class="wf-rail"><div class="wf-t wf-rail-brand">Baywalk</div><div class="wf-t wf-rail-shop">${esc(me.shop.name)}</div><div class="wf-rail-items">${navLink('rail')}</div></div>
<div class="wf-main">
<div class="wf-header" data-part="header"><div class="wf-t wf-brand">Baywalk</div><div class="wf-person"><div class="wf-t wf-person-name">${esc(me.name)}</div><div class="wf-t wf-person-role">${esc(ROLE_LABELS[me.role])}<span class="wf-phone-only"> · ${esc(me.shop.name)}</span></div></div><div class="wf-sign-out"><div class="wf-t wf-sign-out-text">Sign out</div></div></div>
<div class="wf-scroll"><div class="wf-outer"><div class="wf-inner">
<div class="wf-walk-header"><div class="wf-t wf-tree" data-part="tree">${esc(w.doc.title)}</div>${w.job ? `<div class="wf-t wf-job">${esc(walkJobLine(w.job))}</div>` : ''}</div>
<div class="wf-progress" data-part="progress"><div class="wf-t wf-progress-text"><span class="wf-strong">${esc(progress.taken)}</span>${esc(` · ${progress.words}`)}</div><div class="wf-progress-bar"><div class="wf-progress-fill" style="width:${progress.percent}%"></div></div></div>
${w.position.stepsTaken > 0 ? `<div class="wf-row"><div class="wf-button" data-part="back"><div class="wf-t wf-button-text">${esc(BACK_LABEL)}</div></div></div>` : ''}
<div class="wf-step">${cautions}<div class="wf-card"><div class="wf-t wf-kind">${w.position.final ? '■' : '●'} ${esc(STEP_KIND_WORDS[meta.kind])} · step ${w.position.stepsTaken + 1}</div><div class="wf-t wf-title" data-part="title">${esc(meta.title)}</div>${markdownHtml(meta.body)}</div></div>
</div></div></div>
<div class="wf-bar">${navLink('bar')}</div>
</div>
</div>
</div>`;
}

function esc(s: string): string {
  return s.replace(/[&<>"']/g, (c) => ({ '&': '&amp;', '<': '&lt;', '>': '&gt;', '"': '&quot;', "'": '&#39;' })[c]!);
}

function icon(name: string, colour: string): string {
  const line = `stroke="${colour}" stroke-width="2" stroke-linecap="round" stroke-linejoin="round" fill="none"`;
  const shape = (s: IconShape) => {
    switch (s.kind) {
      case 'rect':
        return `<rect x="${s.x}" y="${s.y}" width="${s.width}" height="${s.height}"${s.rx ? ` rx="${s.rx}"` : ''} ${line}/>`;
      case 'path':
        return `<path d="${s.d}" ${line}/>`;
      case 'line':
        return `<line x1="${s.x1}" y1="${s.y1}" x2="${s.x2}" y2="${s.y2}" ${line}/>`;
      case 'circle':
        return s.filled ? `<circle cx="${s.cx}" cy="${s.cy}" r="${s.r}" fill="${colour}" stroke="${colour}"/>` : `<circle cx="${s.cx}" cy="${s.cy}" r="${s.r}" ${line}/>`;
    }
  };
  return `<svg width="24" height="24" viewBox="0 0 24 24">${navIconShapes(name).map(shape).join('')}</svg>`;
}

// No raw HTML from authors, ever: it is text here as it is in the app.
const md = new MarkdownIt({ html: false, linkify: false, typographer: false });

type Token = ReturnType<typeof md.parse>[number];

/**
 * A step's markdown in the shape react-native-markdown-display gives it
 * (components/markdown.tsx): paragraphs as rows of text, lists as number or
 * bullet beside the item. Links are drawn, not followed (the app follows them).
 */
function markdownHtml(body: string): string {
  if (!body.trim()) return '';
  const tokens = md.parse(body, {});
  let out = '<div class="wf-md">';
  const lists: Array<{ ordered: boolean; n: number }> = [];
  for (const t of tokens) {
    switch (t.type) {
      // A tight list's paragraphs are hidden: its items hold their text directly, as the renderer draws them.
      case 'paragraph_open':
        if (!t.hidden) out += '<div class="wf-md-p">';
        break;
      case 'paragraph_close':
        if (!t.hidden) out += '</div>';
        break;
      case 'heading_close':
        out += '</div>';
        break;
      case 'heading_open':
        out += `<div class="wf-md-${t.tag}">`;
        break;
      case 'bullet_list_open':
      case 'ordered_list_open':
        lists.push({ ordered: t.type === 'ordered_list_open', n: Number(t.attrGet('start') ?? 1) });
        out += '<div class="wf-md-list">';
        break;
      case 'bullet_list_close':
      case 'ordered_list_close':
        lists.pop();
        out += '</div>';
        break;
      case 'list_item_open': {
        const list = lists[lists.length - 1];
        const mark = list?.ordered ? `${list.n++}${t.markup}` : '•';
        out += `<div class="wf-md-li"><div class="wf-t wf-md-mark">${esc(mark)}</div><div class="wf-md-li-body">`;
        break;
      }
      case 'list_item_close':
        out += '</div></div>';
        break;
      case 'inline':
        // A text group in the renderer's default type, each piece of text a span in the body's.
        out += t.children?.length ? `<div class="wf-t wf-md-tg">${inlineHtml(t.children)}</div>` : '';
        break;
      case 'fence':
      case 'code_block':
        out += `<div class="wf-md-p"><div class="wf-t wf-md-tg"><span class="wf-md-text">${esc(t.content)}</span></div></div>`;
        break;
      default:
        break;
    }
  }
  return `${out}</div>`;
}

function inlineHtml(children: Token[]): string {
  let out = '';
  for (const c of children) {
    switch (c.type) {
      case 'text':
        out += `<span class="wf-md-text">${esc(c.content)}</span>`;
        break;
      case 'code_inline':
        out += `<span class="wf-md-text wf-md-code">${esc(c.content)}</span>`;
        break;
      case 'softbreak':
      case 'hardbreak':
        out += '<span>\n</span>';
        break;
      case 'strong_open':
        out += '<span class="wf-md-strong">';
        break;
      case 'em_open':
        out += '<span class="wf-md-em">';
        break;
      case 'link_open':
        out += '<span class="wf-md-link">';
        break;
      case 'strong_close':
      case 'em_close':
      case 'link_close':
        out += '</span>';
        break;
      default:
        if (c.content) out += `<span class="wf-md-text">${esc(c.content)}</span>`;
    }
  }
  return out;
}
