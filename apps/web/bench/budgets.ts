import type { Budget } from './figures';

/** The performance budgets of the web app, each with where its number comes from. */
export const budgets = {
  initialJsGzipBytes: { max: 250_000, source: 'the issue: initial JavaScript of the signed-in app under 250 kB gzip' },
  // web.dev's Core Web Vitals guidance calls an FCP of 1.8 s or less "good" (from memory).
  firstContentfulPaintMs: { max: 1_800, source: 'web.dev: first contentful paint ≤ 1.8 s is "good" (from memory)' },
  // Lighthouse scores a time to interactive under about 3.8 s as fast (from memory).
  timeToInteractiveMs: { max: 3_800, source: 'Lighthouse: time to interactive ≤ 3.8 s scores as fast (from memory)' },
  // RAIL: a page that is not the first load should show its content within about 2 s (from memory).
  listRenderedMs: { max: 2_000, source: 'RAIL model: content of a later load within 2 s (from memory)' },
  // RAIL: a transition that needs the network should finish within 1 s to keep the user on task (from memory).
  interactionMs: { max: 1_000, source: 'RAIL model: a task that needs the network done within 1 s (from memory)' },
  // The lists page 50 rows at a time; twice that is the most a page may draw, never the whole shelf.
  rowsAtOnce: { max: 100, source: 'the issue: lists paginated, not 500 or 1,000 rows at once (the app pages 50)' },
  // Lighthouse warns about pages of more than about 1,400 elements (from memory); the limit here is twice that.
  domNodes: { max: 3_000, source: 'Lighthouse flags a DOM over about 1,400 elements (from memory); budget set at about twice that' },
} satisfies Record<string, Budget>;
