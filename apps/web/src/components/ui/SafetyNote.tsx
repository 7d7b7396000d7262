import { useId, type ReactNode } from 'react';
import { cx } from '../../lib/cx';

interface Caution {
  topic: string;
  text: string;
  glyph: ReactNode;
}

// Everyday cautions for mixing and pouring epoxy; the product's own SDS/TDS always comes first.
const cautions: readonly Caution[] = [
  {
    topic: 'Air',
    text: 'Mix and pour with the shop ventilated; fumes build up fastest in small, closed rooms and during a heavy exotherm.',
    glyph: <path d="M3 8h10a3 3 0 1 0-3-3M3 12h14a3 3 0 1 1-3 3M3 16h6" />,
  },
  {
    topic: 'Skin',
    text: 'Wear nitrile gloves and long sleeves. Uncured resin and hardener can sensitise skin, and a reaction tends to come back worse each time.',
    glyph: <path d="M7 20v-8.5a1.5 1.5 0 0 1 3 0V4.5a1.5 1.5 0 0 1 3 0V11m0-5.5a1.5 1.5 0 0 1 3 0V12m0-4a1.5 1.5 0 0 1 3 0v6a6 6 0 0 1-6 6h-3" />,
  },
  {
    topic: 'Eyes',
    text: 'Wear safety glasses while mixing, pouring and sanding; keep an eyewash or clean running water close.',
    glyph: <path d="M2 12s3.5-6 10-6 10 6 10 6-3.5 6-10 6S2 12 2 12Zm10 3a3 3 0 1 0 0-6 3 3 0 0 0 0 6Z" />,
  },
  {
    topic: 'Heat',
    text: 'Mixed resin heats itself. Never pour deeper or mix larger batches than the data sheet allows, and never leave a mixed cup standing: it can smoke, crack or catch fire.',
    glyph: <path d="M12 2c1 4 5 5.5 5 10.5a5 5 0 0 1-10 0c0-2.5 1.5-4 2.5-5 0 2 1 3 2 3 0-3.5-1-5.5.5-8.5Z" />,
  },
  {
    topic: 'Heat guns',
    text: 'A heat gun or torch for bubbles is an ignition source: keep solvents, rags and dust away from it and keep it moving.',
    glyph: <path d="M3 7h11l3 2.5v1L14 13H3zM7 13v7h3.5v-7M19 10h2.5" />,
  },
  {
    topic: 'Waste',
    text: 'Let leftovers cure in an open, non-flammable container before disposal, and follow local rules for liquid resin, hardener and solvent waste.',
    glyph: <path d="M5 7h14M9 7V4h6v3M7 7l1 13h8l1-13M10 11v6M14 11v6" />,
  },
];

export interface SafetyNoteProps {
  className?: string;
  headingLevel?: 2 | 3;
}

/** Resin safety in plain words, always deferring to the product's SDS/TDS and local codes. */
export function SafetyNote({ className, headingLevel = 2 }: SafetyNoteProps) {
  const Heading = headingLevel === 2 ? 'h2' : 'h3';
  const headingId = useId();
  return (
    <aside aria-labelledby={headingId} className={cx('rounded-xl border-2 border-walnut-800 bg-white p-5 sm:p-6', className)}>
      <Heading id={headingId} className="mb-1 flex items-center gap-2 text-xl font-bold text-walnut-900">
        <svg aria-hidden="true" viewBox="0 0 24 24" className="size-6 fill-none stroke-current stroke-2">
          <path d="M12 2.5 4 5.5v6c0 5 3.4 8.6 8 10 4.6-1.4 8-5 8-10v-6l-8-3Z" />
          <path d="M12 8v5M12 16v.5" strokeLinecap="round" />
        </svg>
        Before you mix
      </Heading>
      <p className="mb-4 text-ink-soft">Always follow the product&apos;s SDS and TDS and your local codes. They outrank anything here.</p>
      <ul className="grid gap-3 sm:grid-cols-2">
        {cautions.map((caution) => (
          <li key={caution.topic} className="flex gap-3 rounded-lg bg-paper p-3">
            <svg
              aria-hidden="true"
              viewBox="0 0 24 24"
              className="mt-0.5 size-6 shrink-0 fill-none stroke-walnut-700 stroke-[1.8]"
              strokeLinecap="round"
              strokeLinejoin="round"
            >
              {caution.glyph}
            </svg>
            <p>
              <strong className="font-bold text-walnut-900">{caution.topic}. </strong>
              {caution.text}
            </p>
          </li>
        ))}
      </ul>
    </aside>
  );
}
