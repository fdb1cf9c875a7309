import { createElement } from 'react';
import { renderToStaticMarkup } from 'react-dom/server';
import { describe, expect, it } from 'vitest';
import { season2025 } from '../../../shared/domain/season/season-2025';
import * as mod from './field-drawing';
import { ALLIANCE_COLOURS, FieldDrawing, windowViewBox, type FieldLayer } from './field-drawing';

const render = (layers: FieldLayer[] = []) => renderToStaticMarkup(createElement(FieldDrawing, { season: season2025, layers }));
const count = (html: string, needle: string) => html.split(needle).length - 1;

describe('FieldDrawing', () => {
  it('uses a metre viewBox around the 17.548 × 8.052 m field with y negated', () => {
    // Default 0.3 m margin: −0.3, −(8.052 + 0.3), 17.548 + 0.6, 8.052 + 0.6.
    const html = render();
    const viewBox = /viewBox="([^"]+)"/.exec(html)?.[1]?.split(' ').map(Number) ?? [];
    expect(viewBox[0]).toBeCloseTo(-0.3, 9);
    expect(viewBox[1]).toBeCloseTo(-8.352, 9);
    expect(viewBox[2]).toBeCloseTo(18.148, 9);
    expect(viewBox[3]).toBeCloseTo(8.652, 9);
    expect(html).toContain('scale(1 -1)');
  });

  it('names itself for assistive technology', () => {
    expect(render()).toContain('aria-label="Field map"');
  });

  it('letters all 24 branches on the two reefs', () => {
    const html = render();
    expect(count(html, 'data-element="reef"')).toBe(2);
    expect(count(html, 'data-branch=')).toBe(24);
    for (const letter of 'ABCDEFGHIJKL') expect(count(html, `data-branch="${letter}"`)).toBe(2);
  });

  it('draws four coral stations, two processors, the barge, six cages and two starting lines', () => {
    const html = render();
    expect(count(html, 'data-element="coral-station"')).toBe(4);
    expect(count(html, 'data-element="processor"')).toBe(2);
    expect(count(html, 'data-element="barge"')).toBe(1);
    expect(count(html, 'data-element="cage"')).toBe(6);
    expect(count(html, 'data-element="starting-line"')).toBe(2);
  });

  // Okabe & Ito, "Color Universal Design" (2008): vermilion #D55E00 and blue #0072B2.
  it('colours the alliances with the Okabe–Ito vermilion and blue', () => {
    expect(ALLIANCE_COLOURS).toEqual({ red: '#D55E00', blue: '#0072B2' });
    const html = render();
    expect(html).toContain('#D55E00');
    expect(html).toContain('#0072B2');
  });

  it('draws robot, trail and target layers in order', () => {
    const html = render([
      { kind: 'trail', id: 't', points: [{ xM: 1, yM: 1 }, { xM: 2, yM: 1.5 }], colour: '#009E73' },
      { kind: 'robot', id: 'gullwing', xM: 2, yM: 1.5, headingDeg: 90, widthM: 0.6, lengthM: 0.8, colour: '#0072B2' },
      { kind: 'target', id: 'A', xM: 3.1576, yM: 4.191, headingDeg: 0, colour: '#000000', label: 'A' },
    ]);
    expect(html).toContain('points="1,1 2,1.5"');
    const trailAt = html.indexOf('data-layer="trail"');
    const robotAt = html.indexOf('data-layer="robot"');
    const targetAt = html.indexOf('data-layer="target"');
    expect(trailAt).toBeGreaterThan(0);
    expect(robotAt).toBeGreaterThan(trailAt);
    expect(targetAt).toBeGreaterThan(robotAt);
    expect(html).toContain('translate(3.1576 4.191) rotate(0)');
  });

  it('shows only a window of the field when given one, with y negated like the whole field', () => {
    const html = renderToStaticMarkup(
      createElement(FieldDrawing, { season: season2025, window: { xMinM: 2.5, yMinM: 2, xMaxM: 6.5, yMaxM: 6 } }),
    );
    expect(html).toContain('viewBox="2.5 -6 4 4"');
    expect(windowViewBox({ xMinM: 11, yMinM: 1.5, xMaxM: 15, yMaxM: 6.5 })).toEqual({ minX: 11, minY: -6.5, width: 4, height: 5 });
  });

  it('fills a highlighted target and marks it for tests and styling', () => {
    const html = render([
      { kind: 'target', id: 'A', xM: 3, yM: 4, colour: '#009E73' },
      { kind: 'target', id: 'B', xM: 3, yM: 4.3, colour: '#009E73', isHighlighted: true },
    ]);
    expect(count(html, 'data-highlighted="true"')).toBe(1);
    expect(html).toMatch(/data-id="B" data-highlighted="true"/);
    expect(count(html, 'fill="#009E73"')).toBe(1);
  });

  it('has only named exports', () => {
    expect('default' in mod).toBe(false);
  });
});

describe('turnedWindow', () => {
  it('turns a window 180° about the field centre (red view)', () => {
    // The blue reef's close-up window maps onto the red reef's, by the field's 180° symmetry (FACTS.md).
    const turned = mod.turnedWindow({ xMinM: 3, xMaxM: 6, yMinM: 2.5, yMaxM: 5.5 }, 17.548, 8.052);
    expect(turned.xMinM).toBeCloseTo(11.548, 9);
    expect(turned.xMaxM).toBeCloseTo(14.548, 9);
    expect(turned.yMinM).toBeCloseTo(2.552, 9);
    expect(turned.yMaxM).toBeCloseTo(5.552, 9);
  });
});

describe('FieldDrawing viewFrom', () => {
  it('turns the field for the red view and keeps letters upright', () => {
    const red = renderToStaticMarkup(createElement(FieldDrawing, { season: season2025, viewFrom: 'red' }));
    expect(red).toContain('rotate(180 8.774 4.026)');
    expect(red).toContain('rotate(-180) scale(1 -1)');
    expect(render()).toContain('rotate(0 8.774 4.026)');
  });
});

