import type { ReactNode } from 'react';
import { Card } from '../../../components/ui/Card';
import { DocumentTitle } from '../../../components/ui/DocumentTitle';
import { PageHeader } from '../../../components/ui/PageHeader';
import { TextLink } from '../../../components/ui/TextLink';

export interface NewProductPageProps {
  title: string;
  description: string;
  mayKeep: boolean;
  /** Shown instead of the form to whoever may not keep the shelf. */
  notAllowed: ReactNode;
  cardClassName: string;
  form: ReactNode;
  backHref: string;
}

/** Adding one product to the shelf. */
export function NewProductPage({ title, description, mayKeep, notAllowed, cardClassName, form, backHref }: NewProductPageProps) {
  return (
    <>
      <DocumentTitle title={title} />
      <PageHeader eyebrow="Shelf" title={title} description={description} />
      {mayKeep ? <Card className={cardClassName}>{form}</Card> : notAllowed}
      <p className="mt-6">
        <TextLink to={backHref}>Back to the shelf</TextLink>
      </p>
    </>
  );
}
