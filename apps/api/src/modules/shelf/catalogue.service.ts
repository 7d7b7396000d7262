import type { DataSource, EntityManager, EntityTarget, ObjectLiteral } from 'typeorm';
import type { AuthContext } from '../../http/auth-context';
import { notFound } from '../../http/errors';
import { recordAudit } from '../audit/audit.service';
import { orderByColumn, type SortDir } from './shelf-sort';

export interface CatalogueQuery<Sort extends string> {
  q?: string;
  includeArchived?: 'true' | 'false';
  sort?: Sort;
  dir: SortDir;
  limit: number;
  offset: number;
}

export const likePattern = (q: string) => `%${q.replace(/[\\%_]/g, (c) => `\\${c}`)}%`;

interface CatalogueRow extends ObjectLiteral {
  id: string;
  shopId: string;
  name: string;
  archivedAt: Date | null;
}

/**
 * The SQL (on alias `p`) behind each column a product table sorts by; `name` is the default order.
 * Names are compared in lower case because the database collates bytewise ("C").
 */
export type CatalogueSortColumns<Sort extends string> = Record<Sort | 'name', string>;

/**
 * The shelf's products share one life cycle: listed (by name unless another column is chosen), created, replaced whole from the data
 * sheet, archived (never deleted: old plans keep their snapshot, lots keep their product).
 */
export class Catalogue<Row extends CatalogueRow, View, Sort extends string> {
  constructor(
    private readonly ds: DataSource,
    private readonly entity: EntityTarget<Row>,
    private readonly objectType: string,
    private readonly view: (row: Row) => View,
    private readonly sortColumns: CatalogueSortColumns<Sort>,
  ) {}

  async list(shopId: string, q: CatalogueQuery<Sort>): Promise<{ items: View[]; total: number }> {
    const qb = this.ds.getRepository(this.entity).createQueryBuilder('p').where('p.shop_id = :shopId', { shopId });
    if (q.includeArchived !== 'true') qb.andWhere('p.archived_at IS NULL');
    if (q.q) qb.andWhere('p.name ILIKE :like', { like: likePattern(q.q) });
    const [rows, total] = await orderByColumn(qb, this.sortColumns[q.sort ?? 'name'], q.dir, 'p.id')
      .offset(q.offset)
      .limit(q.limit)
      .getManyAndCount();
    return { items: rows.map(this.view), total };
  }

  async find(m: EntityManager, shopId: string, id: string): Promise<Row> {
    const row = await m.findOne(this.entity, { where: { id, shopId } as never });
    if (!row) throw notFound(this.objectType.replace('_', ' '));
    return row;
  }

  async get(shopId: string, id: string): Promise<View> {
    return this.view(await this.find(this.ds.manager, shopId, id));
  }

  async create(auth: AuthContext, columns: Partial<Row>): Promise<View> {
    return this.ds.transaction(async (m) => {
      const row = await m.save(m.create(this.entity, { ...columns, shopId: auth.shopId } as never));
      await recordAudit(m, {
        shopId: auth.shopId,
        actor: auth,
        action: `${this.objectType}.create`,
        objectType: this.objectType,
        objectId: (row as Row).id,
        detail: { name: (row as Row).name },
      });
      return this.view(row as Row);
    });
  }

  async replace(auth: AuthContext, id: string, columns: Partial<Row>): Promise<View> {
    return this.ds.transaction(async (m) => {
      const row = await m.findOne(this.entity, { where: { id, shopId: auth.shopId } as never, lock: { mode: 'pessimistic_write' } });
      if (!row) throw notFound(this.objectType.replace('_', ' '));
      Object.assign(row, columns);
      await m.save(row);
      await recordAudit(m, {
        shopId: auth.shopId,
        actor: auth,
        action: `${this.objectType}.update`,
        objectType: this.objectType,
        objectId: id,
        detail: { name: row.name },
      });
      return this.view(row);
    });
  }

  async archive(auth: AuthContext, id: string): Promise<void> {
    await this.ds.transaction(async (m) => {
      const row = await this.find(m, auth.shopId, id);
      if (!row.archivedAt) await m.update(this.entity, { id } as never, { archivedAt: new Date() } as never);
      await recordAudit(m, {
        shopId: auth.shopId,
        actor: auth,
        action: `${this.objectType}.archive`,
        objectType: this.objectType,
        objectId: id,
        detail: { name: row.name },
      });
    });
  }
}
