import type { UnitSystem } from '@gelpoint/core';
import type { UseQueryResult } from '@tanstack/react-query';
import type { ReactNode } from 'react';
import { Alert } from '../../../components/ui/Alert';
import { Card } from '../../../components/ui/Card';
import { DocumentTitle } from '../../../components/ui/DocumentTitle';
import { PageHeader } from '../../../components/ui/PageHeader';
import { QueryResult } from '../../../components/ui/QueryResult';
import { TextLink } from '../../../components/ui/TextLink';
import { ArchiveProductButton } from './ArchiveProductButton';
import { ArchivedMark } from './ArchivedMark';

export interface ProductPageProps {
  product: { id: string; name: string; archived: boolean };
  /** The kind of product in the eyebrow, e.g. "pigment". */
  kind: string;
  description: ReactNode;
  /** Whoever keeps the shelf edits the product; everyone else reads its data sheet. */
  mayKeep: boolean;
  archive: { isPending: boolean; error: unknown; mutate: (productId: string) => void; reset: () => void };
  /** The last save went through and nothing is saving now. */
  saved: boolean;
  cardClassName: string;
  form: ReactNode;
  shop: UseQueryResult<{ unitSystem: UnitSystem; currency: string }>;
  sheet: (unitSystem: UnitSystem, currency: string) => ReactNode;
  backHref: string;
}

/** One product on the shelf: its form for whoever keeps the shelf, its data sheet for everyone else. */
export function ProductPage({ product, kind, description, mayKeep, archive, saved, cardClassName, form, shop, sheet, backHref }: ProductPageProps) {
  return (
    <>
      <DocumentTitle title={product.name} />
      <PageHeader
        eyebrow={`Shelf · ${kind}`}
        title={product.name}
        description={
          <>
            {description}
            {product.archived ? <ArchivedMark /> : null}
          </>
        }
        actions={
          mayKeep && !product.archived ? (
            <ArchiveProductButton
              name={product.name}
              busy={archive.isPending}
              error={archive.error}
              archive={() => archive.mutate(product.id)}
              reset={() => archive.reset()}
            />
          ) : null
        }
      />
      {mayKeep ? (
        <Card className={cardClassName}>
          {saved ? (
            <Alert tone="success" className="mb-5">
              Saved. Pour plans made from now on use these values; saved plans keep the ones they were made with.
            </Alert>
          ) : null}
          {form}
        </Card>
      ) : (
        <QueryResult query={shop} loadingLabel="Loading the shop's units…">
          {(s) => sheet(s.unitSystem, s.currency)}
        </QueryResult>
      )}
      <p className="mt-6">
        <TextLink to={backHref}>Back to the shelf</TextLink>
      </p>
    </>
  );
}
