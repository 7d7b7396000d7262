import type { SelectQueryBuilder, ObjectLiteral } from 'typeorm';

export type SortDir = 'asc' | 'desc';

/**
 * Orders the whole list, before it is paged, by one column's SQL expression, with the row id as the
 * tiebreak so that paging with offset never repeats or skips a row. Empty values stay last both ways:
 * a lot that never expires is neither the first nor the last to expire.
 */
export function orderByColumn<T extends ObjectLiteral>(qb: SelectQueryBuilder<T>, expression: string, dir: SortDir, idColumn: string): SelectQueryBuilder<T> {
  const order = dir === 'desc' ? 'DESC' : 'ASC';
  return qb.orderBy(expression, order, 'NULLS LAST').addOrderBy(idColumn, order);
}
