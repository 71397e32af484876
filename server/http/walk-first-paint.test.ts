import { describe, expect, it } from 'vitest';
import type { Me } from '@/shared/schemas/auth';
import type { WalkDetail } from '@/shared/schemas/walks';
import { walkFirstPaint } from './walk-first-paint';

const me: Me = { id: 1, name: 'Ana <Bold> "Reyes"', email: 'ana@shop.example', role: 'tech', shop: { id: 1, name: 'Shop & Sons' } };

/** A walk at a step whose words an author (or an attacker) wrote. */
function walkWith(meta: Record<string, unknown>): WalkDetail {
  return {
    walk: { id: 7 },
    job: { roNumber: 'RO-1', customerName: 'Kit <i>Lee</i>', year: 2010, make: 'Ford', model: 'Focus' },
    shop: { name: 'Shop & Sons', pressureUnit: 'inHg' },
    doc: { title: 'Tree <script>alert(1)</script>', machine: { states: { s1: { meta } } } },
    position: { stepId: 's1', final: false, path: ['s1'], stepsTaken: 0, shortestToCause: 2 },
    history: [],
    photos: [],
  } as unknown as WalkDetail;
}

describe('walkFirstPaint', () => {
  it('draws every word an author or a person wrote as text, never as markup', () => {
    const html = walkFirstPaint(
      me,
      walkWith({
        kind: 'ask',
        title: 'Is the <img src=x onerror=alert(1)> hose on?',
        body: 'Look <b>here</b> and [there](https://example.com/x) or [not](javascript:alert(1)).\n\n1. **First** step\n2. Second',
        cautions: [{ hazard: 'hot_parts', text: 'Hot & "very" <hot>' }],
      }),
    );
    for (const raw of ['<script', '<img', '<b>', '<i>', 'onerror=alert(1)>', 'href=']) expect(html).not.toContain(raw);
    expect(html).toContain('Is the &lt;img src=x onerror=alert(1)&gt; hose on?');
    expect(html).toContain('Hot &amp; &quot;very&quot; &lt;hot&gt;');
    expect(html).toContain('Ana &lt;Bold&gt; &quot;Reyes&quot;');
    // The link is drawn as its words only; the list keeps its numbers.
    expect(html).toContain('<span class="wf-md-link"><span class="wf-md-text">there</span></span>');
    expect(html).toMatch(/wf-md-mark">1\.<\/div>[\s\S]*wf-md-mark">2\.<\/div>/);
    // Inert: nothing in it can be focused or pressed, and it says it is not the page itself.
    expect(html).toContain('id="boot-shell-walk" class="wf" inert');
    expect(html).not.toMatch(/<(a|button|input)\b/);
  });

  it('shows the cautions before the step, and no Back button before the first answer', () => {
    const html = walkFirstPaint(me, walkWith({ kind: 'reading', title: 'Read the trim', body: 'Enter it.', cautions: [{ hazard: 'exhaust_gas', text: 'Outdoors only.' }] }));
    expect(html.indexOf('Caution: read before you start')).toBeLessThan(html.indexOf('Read the trim'));
    expect(html).toContain('● Measure · step 1');
    expect(html).not.toContain('Back: undo last answer');
  });

  it('draws nothing for a step the document does not have', () => {
    const w = walkWith({ kind: 'ask', title: 'x', body: '', cautions: [] });
    expect(walkFirstPaint(me, { ...w, position: { ...w.position, stepId: 'gone' } })).toBe('');
  });
});
