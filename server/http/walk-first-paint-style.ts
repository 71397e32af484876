import { colors, fonts, maxContentWidth, wideBreakpoint } from '@/components/theme';

/**
 * The styles of a walk page's first paint (walk-first-paint.ts): what
 * react-native-web gives each view and text, with the sizes and colours of
 * components/theme.ts (imported: a colour changed there changes here) and the
 * walk screen's style sheets. A view is a column flexbox that does not
 * shrink; a text wraps and keeps its spaces. The layout switches at
 * `wideBreakpoint`, as the app does.
 */
const C = colors;
const F = { regular: `'${fonts.regular}', sans-serif`, semibold: `'${fonts.semibold}', sans-serif`, bold: `'${fonts.bold}', sans-serif` };

export const WALK_SHELL_STYLE = `
#boot-shell-walk { position: fixed; inset: 0; z-index: 10; background: ${C.paper}; color: ${C.ink}; overflow: hidden; }
:where(.wf div, .wf a) { display: flex; flex-direction: column; flex-shrink: 0; flex-basis: auto; align-items: stretch; min-width: 0; min-height: 0; position: relative; box-sizing: border-box; margin: 0; padding: 0; border: 0 solid #000; text-decoration: none; }
:where(.wf .wf-t) { display: inline; flex-shrink: 1; white-space: pre-wrap; overflow-wrap: break-word; font: 14px ${F.regular}; color: #000; }
:where(.wf span) { font: inherit; color: inherit; white-space: inherit; }
.wf-root { height: 100%; flex-direction: column; }
.wf-rail { display: none; }
.wf-main { flex: 1 1 0%; }
.wf-header { flex-direction: row; align-items: center; gap: 12px; padding: 8px 16px; background: ${C.surface}; border-bottom: 1px solid ${C.line}; }
.wf .wf-brand { font: 21px/28px ${F.bold}; color: ${C.accentDark}; flex-shrink: 0; }
.wf-person { flex: 1 1 0%; align-items: flex-end; min-width: 0; }
.wf .wf-person-name { font: 16px ${F.bold}; color: ${C.ink}; max-width: 100%; overflow: hidden; text-overflow: ellipsis; white-space: nowrap; }
.wf .wf-person-role { font: 14px/19px ${F.regular}; color: ${C.inkMuted}; max-width: 100%; overflow: hidden; text-overflow: ellipsis; white-space: nowrap; }
.wf-sign-out { min-height: 48px; padding: 0 12px; border-radius: 10px; border: 2px solid ${C.accent}; align-items: center; justify-content: center; }
.wf .wf-sign-out-text { font: 15px ${F.bold}; color: ${C.accentDark}; }
.wf-scroll { flex: 1 1 0%; overflow-x: hidden; overflow-y: auto; background: ${C.paper}; }
.wf-outer { align-items: center; padding: 24px 16px; }
.wf-inner { width: 100%; max-width: ${maxContentWidth}px; gap: 16px; }
.wf-walk-header { gap: 2px; }
.wf .wf-tree { font: 15px ${F.semibold}; color: ${C.accentDark}; }
.wf .wf-job, .wf .wf-progress-text, .wf .wf-small { font: 14px/19px ${F.regular}; color: ${C.inkMuted}; }
.wf-progress { gap: 4px; }
.wf .wf-strong { font-family: ${F.bold}; color: ${C.ink}; }
.wf-progress-bar { height: 8px; border-radius: 4px; background: ${C.line}; overflow: hidden; }
.wf-progress-fill { height: 8px; background: ${C.accent}; }
.wf-row { flex-direction: row; flex-wrap: wrap; gap: 12px; }
.wf-button { min-height: 48px; padding: 0 24px; border-radius: 10px; align-items: center; justify-content: center; flex-direction: row; gap: 8px; background: ${C.surface}; border: 2px solid ${C.accent}; }
.wf .wf-button-text { font: 17px ${F.bold}; color: ${C.accentDark}; }
.wf-step { gap: 16px; }
.wf-caution { border: 3px solid ${C.caution}; background: ${C.cautionSoft}; border-radius: 10px; padding: 16px; gap: 12px; }
.wf .wf-caution-head { font: 19px ${F.bold}; color: ${C.caution}; }
.wf-caution-item { gap: 2px; }
.wf .wf-hazard { font: 16px ${F.bold}; color: ${C.caution}; }
.wf .wf-caution-text { font: 17px/25px ${F.regular}; color: ${C.ink}; }
.wf-card { background: ${C.surface}; border-radius: 16px; border: 1px solid ${C.line}; padding: 16px; gap: 12px; }
.wf .wf-kind { font: 14px ${F.semibold}; color: ${C.inkMuted}; text-transform: uppercase; letter-spacing: 0.5px; }
.wf .wf-title { font: 21px/28px ${F.bold}; color: ${C.ink}; }
.wf-md-p { flex-direction: row; flex-wrap: wrap; align-items: flex-start; justify-content: flex-start; width: 100%; margin: 0 0 8px; }
/* The text group keeps the renderer's default type (14 px, normal line height); its spans carry the body's. */
.wf .wf-md-text, .wf .wf-md-mark { font: 17px/25px ${F.regular}; color: ${C.ink}; }
.wf .wf-md-h1 .wf-md-text { font: 21px/28px ${F.bold}; }
.wf .wf-md-h2 .wf-md-text { font: 19px/26px ${F.bold}; }
.wf .wf-md-h3 .wf-md-text { font: 18px/24px ${F.semibold}; }
.wf-md-h1, .wf-md-h2 { margin-bottom: 8px; }
.wf-md-h3 { margin-bottom: 4px; }
.wf .wf-md-strong .wf-md-text { font-family: ${F.bold}; }
.wf .wf-md-em .wf-md-text { font-style: italic; }
.wf .wf-md-text.wf-md-code { font-family: ${F.semibold}; background: ${C.paper}; }
.wf .wf-md-link .wf-md-text { font-family: ${F.semibold}; color: ${C.accentDark}; }
.wf-md-list { margin-bottom: 8px; }
.wf-md-li { flex-direction: row; justify-content: flex-start; margin-bottom: 4px; }
.wf .wf-md-mark { margin: 0 10px; }
.wf-md-li-body { flex: 1 1 0%; }
.wf-bar { flex-direction: row; background: ${C.surface}; border-top: 1px solid ${C.line}; padding: 0 4px 4px; }
.wf-bar-item { flex: 1 1 0%; min-height: 60px; align-items: center; justify-content: center; gap: 2px; border-top: 3px solid transparent; }
.wf-bar-item.wf-active { border-top-color: ${C.accent}; background: ${C.accentSoft}; }
.wf .wf-bar-label { font: 14px ${F.semibold}; }
.wf .wf-active .wf-t { font-family: ${F.bold}; }
.wf-rail-items { gap: 4px; }
.wf-rail-item { min-height: 52px; flex-direction: row; align-items: center; gap: 12px; padding: 0 12px; border-radius: 10px; }
.wf-rail-item.wf-active { background: ${C.paper}; }
.wf .wf-rail-label { font: 17px ${F.semibold}; }
.wf .wf-rail-brand { font: 28px/34px ${F.bold}; color: ${C.paper}; padding: 0 8px; }
.wf .wf-rail-shop { font: 14px/19px ${F.regular}; color: ${C.line}; padding: 0 8px; margin-bottom: 16px; display: -webkit-box; -webkit-line-clamp: 2; -webkit-box-orient: vertical; overflow: hidden; }
@media (min-width: ${wideBreakpoint}px) {
  .wf-root { flex-direction: row; }
  .wf-rail { display: flex; width: 220px; background: ${C.ink}; padding: 24px 12px; gap: 4px; }
  .wf-bar, .wf .wf-brand, .wf-phone-only { display: none; }
  .wf-header { justify-content: flex-end; padding: 8px 24px; }
}
`;
