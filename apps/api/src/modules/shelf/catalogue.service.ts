import type { DataSource, EntityManager, EntityTarget, ObjectLiteral } from 'typeorm';
import type { AuthContext } from '../../http/auth-context';
import { notFound } from '../../http/errors';
import { recordAudit } from '../audit/audit.service';

export interface CatalogueQuery {
  q?: string;
  includeArchived?: 'true' | 'false';
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
 * The shelf's products share one life cycle: listed by name, created, replaced whole from the data
 * sheet, archived (never deleted: old plans keep their snapshot, lots keep their product).
 */
export class Catalogue<Row extends CatalogueRow, View> {
  constructor(
    private readonly ds: DataSource,
    private readonly entity: EntityTarget<Row>,
    private readonly objectType: string,
    private readonly view: (row: Row) => View,
  ) {}

  async list(shopId: string, q: CatalogueQuery): Promise<{ items: View[]; total: number }> {
    const qb = this.ds.getRepository(this.entity).createQueryBuilder('p').where('p.shop_id = :shopId', { shopId });
    if (q.includeArchived !== 'true') qb.andWhere('p.archived_at IS NULL');
    if (q.q) qb.andWhere('p.name ILIKE :like', { like: likePattern(q.q) });
    const [rows, total] = await qb.orderBy('p.name', 'ASC').addOrderBy('p.id').take(q.limit).skip(q.offset).getManyAndCount();
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
      await recordAudit(m, { shopId: auth.shopId, actor: auth, action: `${this.objectType}.create`, objectType: this.objectType, objectId: (row as Row).id, detail: { name: (row as Row).name } });
      return this.view(row as Row);
    });
  }

  async replace(auth: AuthContext, id: string, columns: Partial<Row>): Promise<View> {
    return this.ds.transaction(async (m) => {
      const row = await m.findOne(this.entity, { where: { id, shopId: auth.shopId } as never, lock: { mode: 'pessimistic_write' } });
      if (!row) throw notFound(this.objectType.replace('_', ' '));
      Object.assign(row, columns);
      await m.save(row);
      await recordAudit(m, { shopId: auth.shopId, actor: auth, action: `${this.objectType}.update`, objectType: this.objectType, objectId: id, detail: { name: row.name } });
      return this.view(row);
    });
  }

  async archive(auth: AuthContext, id: string): Promise<void> {
    await this.ds.transaction(async (m) => {
      const row = await this.find(m, auth.shopId, id);
      if (!row.archivedAt) await m.update(this.entity, { id } as never, { archivedAt: new Date() } as never);
      await recordAudit(m, { shopId: auth.shopId, actor: auth, action: `${this.objectType}.archive`, objectType: this.objectType, objectId: id, detail: { name: row.name } });
    });
  }
}
