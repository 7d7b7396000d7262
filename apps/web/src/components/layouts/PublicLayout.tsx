import type { ReactNode } from 'react';
import { Link } from 'react-router';
import { paths } from '../../config/paths';
import { Wordmark } from '../brand/Wordmark';

/** The pages before sign-in: one calm column, the mark on top, the form in a card. */
export function PublicLayout({ children }: { children: ReactNode }) {
  return (
    <div className="flex min-h-dvh flex-col bg-paper-deep">
      <header className="px-4 pt-8 pb-4 sm:pt-12">
        <div className="mx-auto w-full max-w-md">
          <Link to={paths.signIn.getHref()} className="inline-flex min-h-touch items-center rounded-lg">
            <Wordmark />
            <span className="sr-only">, go to sign in</span>
          </Link>
        </div>
      </header>
      <main id="main" className="flex-1 px-4 pb-12">
        <div className="mx-auto w-full max-w-md rounded-2xl border border-line bg-white p-5 shadow-sm sm:p-8">{children}</div>
      </main>
      <footer className="px-4 pb-6 text-center text-sm text-ink-soft">Gelpoint keeps the numbers; the product&apos;s SDS and TDS keep the rules.</footer>
    </div>
  );
}
