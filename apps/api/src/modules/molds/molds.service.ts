import { createHash } from 'node:crypto';
import type { RequestHandler } from 'express';
import type { Logger } from 'pino';
import type { DataSource, EntityManager } from 'typeorm';
import { planCavityFromMold } from '@gelpoint/core';
import { MOLD_ANALYSIS_CHANNEL, Mold, Piece, storeMoldAnalysis, type MoldFormat, type UpAxis } from '@gelpoint/db';
import type { CavityReport, Dam, LevelFrom, MoldDepthMap, MoldFill, MoldView, UpdateMoldRequest } from '@gelpoint/contracts';
import { fillAt, layerVolumes, planCavityFacts, type CavityModel, type DepthMapRecord } from '@gelpoint/mesh';
import type { AuthContext } from '../../http/auth-context';
import { AppError, notFound } from '../../http/errors';
import { recordAudit } from '../audit/audit.service';
import { UploadQuota } from '../uploads/upload-quota';
import type { MoldCavityLookup } from '../pour-plans/pour-plans.service';
import { AnalysisCache } from './mold-analysis-cache';
import { aboveFloor, floorOf, inMouldFrame } from './mold-levels';
import { namedList, plansUsingMold } from './mold-users';
import { fillView, moldView } from './mold-views';
import { RecentlyUsed } from './recently-used';
import { storeMoldFile } from './mold-file-store';
import type { UploadedMould } from './mold-upload';
import type { StlCheck, StlChecker, UploadAnalysis } from './stl-check';

export interface UploadFields {
  /** Absent: a 3MF is read in the unit it states, any other file in mm. */
  units?: 'mm' | 'cm' | 'in' | undefined;
  up: UpAxis;
  name?: string;
  pieceId?: string;
}

/** The names a mould file may have; what it is, is decided by its content. */
const mouldFileName = /\.(stl|3mf|obj)$/i;
const extensionOf: Record<MoldFormat, string> = { stl: 'stl', '3mf': '3mf', obj: 'obj' };
/** Reader refusals that are about size: the file unpacks to more than the service reads. */
const tooLargeCodes = new Set(['threemf_too_large']);

export class Molds {
  private readonly cache = new AnalysisCache();
  private readonly reports = new RecentlyUsed<NonNullable<Mold['report']>>(64);
  private readonly depthMaps = new RecentlyUsed<{ json: string; etag: string }>(16);

  constructor(
    private readonly ds: DataSource,
    private readonly checker: StlChecker,
    private readonly quota = new UploadQuota(),
    /** Analyse each upload in the checking thread while it is stored, instead of leaving all of it to a worker. */
    private readonly analyseOnUpload = false,
    /** Where a late upload analysis that could not be stored is told (the worker's tick then takes the mould). */
    private readonly logger?: Logger,
  ) {}

  /** Called as an upload starts to arrive: the checking thread starts meanwhile rather than after the last byte. */
  readonly warmUp: RequestHandler = (_req, _res, next) => {
    this.checker.warm();
    next();
  };

  async upload(auth: AuthContext, file: UploadedMould | undefined, fields: UploadFields): Promise<MoldView> {
    if (!file)
      throw new AppError('bad_request', 'file_missing', 'attach the mould file (STL, 3MF or OBJ) in the part named "file"', {
        file: 'choose an STL, 3MF or OBJ file',
      });
    if (!mouldFileName.test(file.originalname)) {
      throw new AppError(
        'unprocessable',
        'not_a_mould_file_name',
        `"${file.originalname.slice(0, 80)}" does not end in .stl, .3mf or .obj; export the mould from your CAD program in one of those formats`,
        { file: 'the file must be an .stl, .3mf or .obj' },
      );
    }
    // The file is read (to refuse a bad one with the reader's sentence) while it is written: a refusal cancels the
    // write and the transaction rolls back whole.
    const stopWrite = new AbortController();
    const underWay = this.checker.check(file.bytes, this.analyseOnUpload ? { units: fields.units ?? null, up: fields.up } : undefined);
    const checking = underWay.check.then((checked) => {
      if (!checked.ok) stopWrite.abort();
      return checked;
    });
    // Whether the analysis came in time to be stored with the upload.
    let analysed: UploadAnalysis = null;
    void underWay.analysis.then((a) => (analysed = a));
    const refusal = (checked: Extract<StlCheck, { ok: false }>) => {
      const kind = tooLargeCodes.has(checked.error.code) ? 'payload_too_large' : 'unprocessable';
      return new AppError(kind, checked.error.code, checked.error.message, { file: checked.error.message });
    };
    const id = await this.ds.transaction(async (m) => {
      if (fields.pieceId && !(await m.findOneBy(Piece, { id: fields.pieceId, shopId: auth.shopId }))) throw notFound('piece');
      await this.quota.reserve(m, auth.userId, file.size);
      // Format, units and triangles are the check's to say; the row is completed below, before anyone can see it.
      const mold = await m.save(
        m.create(Mold, {
          shopId: auth.shopId,
          pieceId: fields.pieceId ?? null,
          // The stored name is ours to choose: the client's file name is kept only as text to show.
          name: fields.name || file.originalname.replace(mouldFileName, '').slice(0, 120) || 'Mould',
          fileName: file.originalname.slice(0, 200),
          format: 'stl',
          units: fields.units ?? 'mm',
          fileUnits: null,
          upAxis: fields.up,
          sizeBytes: file.size,
          sha256: file.sha256,
          status: 'queued',
          triangleCount: null,
          createdById: auth.userId,
        }),
      );
      try {
        await storeMoldFile(m, mold.id, file.bytes, stopWrite.signal);
      } catch (err) {
        const checked = await checking;
        if (!checked.ok) throw refusal(checked);
        throw err;
      }
      const checked = await checking;
      if (!checked.ok) throw refusal(checked);
      const units = fields.units ?? checked.fileUnits ?? 'mm';
      await m.update(Mold, { id: mold.id }, { format: checked.format, units, fileUnits: checked.fileUnits, triangleCount: checked.triangles });
      await recordAudit(m, {
        shopId: auth.shopId,
        actor: auth,
        action: 'mold.upload',
        objectType: 'mold',
        objectId: mold.id,
        detail: { name: mold.name, sha256: file.sha256, format: checked.format, units, triangles: checked.triangles },
      });
      if (analysed) {
        await storeMoldAnalysis(m, mold.id, analysed, true);
      } else if (!this.analyseOnUpload) {
        await m.query('SELECT pg_notify($1, $2)', [MOLD_ANALYSIS_CHANNEL, mold.id]);
      }
      return mold.id;
    });
    // Still analysing: stored when it is done, unless a worker took the mould first (its tick finds a queued mould
    // within a minute, whatever becomes of this process); refused by the engine, it is the worker's to record.
    if (this.analyseOnUpload && !analysed) {
      void underWay.analysis
        .then(async (late) => {
          if (late) await storeMoldAnalysis(this.ds.manager, id, late, true);
          else await this.ds.query('SELECT pg_notify($1, $2)', [MOLD_ANALYSIS_CHANNEL, id]);
        })
        .catch((err: unknown) =>
          this.logger?.warn(
            { moldId: id, err: err instanceof Error ? err.message : String(err) },
            'upload analysis not stored; a worker takes the mould on its tick',
          ),
        );
    }
    return this.get(auth.shopId, id);
  }

  async get(shopId: string, id: string): Promise<MoldView> {
    const find = () => this.ds.getRepository(Mold).findOne({ where: { id, shopId }, select: summarySelect });
    let mold = await find();
    if (!mold) throw notFound('mould');
    // A report is shown only with its analysis finished: while the mould is read again it would describe the old reading.
    const report = mold.status === 'ready' ? await this.reportOf(mold) : null;
    // Reading an outdated analysis queued the mould again: the view says so.
    if (mold.status === 'ready' && report === null) mold = (await find()) ?? mold;
    return moldView({ ...mold, report } as Mold);
  }

  /**
   * A report never changes once analysed, so the large jsonb is read once per analysis, not per view. One written
   * before reports named the cavity floor gets it from the analysis; null when that analysis cannot answer (an
   * outdated one goes back in the queue).
   */
  private async reportOf(mold: Mold): Promise<Mold['report']> {
    const key = mold.analysedAt ? `${mold.id}@${mold.analysedAt.toISOString()}` : undefined;
    const hit = key ? this.reports.get(key) : undefined;
    if (hit) return hit;
    const rows = (await this.ds.query('SELECT report FROM molds WHERE id = $1', [mold.id])) as { report: Mold['report'] }[];
    let report = rows[0]?.report ?? null;
    if (report && !('floorMm' in report)) {
      let model: CavityModel;
      try {
        model = await this.cache.model(this.ds.manager, mold.shopId, mold.id);
      } catch (err) {
        if (err instanceof AppError && err.kind === 'conflict') return null;
        throw err;
      }
      const floorMm: CavityReport['floorMm'] = { outline: floorOf(model, 'outline'), box: floorOf(model, 'box') };
      report = { ...report, floorMm };
    }
    if (key && report) this.reports.set(key, report);
    return report;
  }

  /**
   * The depth map of the report's fill to the top, as the JSON it is served as, with a strong validator: a hash of
   * exactly those bytes, so a browser holding it revalidates without downloading it again.
   */
  async depthMap(shopId: string, id: string): Promise<{ json: string; etag: string }> {
    const rows: { status: string; analysed_at: Date | null }[] = await this.ds.query('SELECT status, analysed_at FROM molds WHERE id = $1 AND shop_id = $2', [
      id,
      shopId,
    ]);
    const row = rows[0];
    if (!row) throw notFound('mould');
    const notReady = () =>
      new AppError(
        'conflict',
        'mold_not_ready',
        row.status === 'failed'
          ? 'this mould could not be analysed; see its error and upload a corrected file'
          : 'the cavity report is not ready yet; try again in a moment',
      );
    if (row.status !== 'ready' || !row.analysed_at) throw notReady();
    // Keyed by the analysis, so a mould read again (new units or up axis) is served anew.
    const key = `${id}@${row.analysed_at.toISOString()}`;
    const hit = this.depthMaps.get(key);
    if (hit) return hit;
    const [stored] = (await this.ds.query(
      `SELECT analysed_at, COALESCE(depth_map, report -> 'fillToTop' -> 'depthMap') AS depth_map,
              (report -> 'fillToTop' ->> 'levelMm')::float8 AS level, report -> 'fillToTop' ->> 'dam' AS dam
         FROM molds WHERE id = $1 AND status = 'ready'`,
      [id],
    )) as { analysed_at: Date; depth_map: DepthMapRecord | null; level: number | null; dam: Dam | null }[];
    // Analysed again between the two reads: the next request finds the new analysis.
    if (!stored?.depth_map || stored.level === null || !stored.dam || stored.analysed_at.getTime() !== row.analysed_at.getTime()) throw notReady();
    const json = JSON.stringify({ ...stored.depth_map, levelMm: stored.level, dam: stored.dam } satisfies MoldDepthMap);
    const served = { json, etag: `"${createHash('sha256').update(json).digest('base64url')}"` };
    this.depthMaps.set(key, served);
    return served;
  }

  async list(shopId: string, q: { pieceId?: string; limit: number; offset: number }) {
    const qb = this.ds
      .getRepository(Mold)
      .createQueryBuilder('m')
      .select(summaryColumns.map((c) => `m.${c}`))
      .addSelect(`(m.report -> 'fillToTop' ->> 'volumeMm3')::float8`, 'fill_to_top')
      .where('m.shop_id = :shopId', { shopId });
    if (q.pieceId) qb.andWhere('m.piece_id = :pieceId', { pieceId: q.pieceId });
    const total = await qb.getCount();
    const { entities, raw } = await qb.orderBy('m.createdAt', 'DESC').addOrderBy('m.id').offset(q.offset).limit(q.limit).getRawAndEntities();
    return {
      total,
      items: entities.map((e, i) => {
        const { report: _r, ...rest } = moldView({ ...e, report: null } as Mold);
        const v = (raw[i] as { fill_to_top: number | null }).fill_to_top;
        return { ...rest, fillVolumeToTopMm3: v === null ? null : Number(v) };
      }),
    };
  }

  /** The uploaded file as it came, named with its format's extension. */
  async stl(shopId: string, id: string): Promise<{ bytes: Buffer; fileName: string }> {
    const rows: { bytes: Buffer; name: string; format: MoldFormat }[] = await this.ds.query(
      'SELECT f.bytes, m.name, m.format FROM mold_files f JOIN molds m ON m.id = f.mold_id WHERE m.id = $1 AND m.shop_id = $2',
      [id, shopId],
    );
    if (!rows[0]) throw notFound('mould');
    return { bytes: rows[0].bytes, fileName: `${rows[0].name.replace(/[^A-Za-z0-9_-]+/g, '-').slice(0, 60) || 'mould'}.${extensionOf[rows[0].format]}` };
  }

  async update(auth: AuthContext, id: string, change: UpdateMoldRequest): Promise<MoldView> {
    await this.ds.transaction(async (m) => {
      const mold = await m.findOne(Mold, {
        where: { id, shopId: auth.shopId },
        select: { id: true, name: true, pieceId: true, units: true, upAxis: true },
        lock: { mode: 'pessimistic_write' },
      });
      if (!mold) throw notFound('mould');
      if (change.pieceId && !(await m.findOneBy(Piece, { id: change.pieceId, shopId: auth.shopId }))) throw notFound('piece');
      const before = { name: mold.name, pieceId: mold.pieceId, units: mold.units, upAxis: mold.upAxis };
      const next = { ...before, ...change };
      const reread = next.units !== before.units || next.upAxis !== before.upAxis;
      await m.update(Mold, { id }, { name: next.name, pieceId: next.pieceId, units: next.units, upAxis: next.upAxis });
      if (reread) {
        // The stored file is read again in the corrected frame, exactly as after an upload; the old report goes with it.
        await m.query(
          `UPDATE molds SET status = 'queued', progress = 0, attempts = 0, locked_until = NULL, error_code = NULL, error_message = NULL,
                  report = NULL, analysis = NULL, analysed_at = NULL, updated_at = now()
            WHERE id = $1`,
          [id],
        );
        await m.query('SELECT pg_notify($1, $2)', [MOLD_ANALYSIS_CHANNEL, id]);
      }
      const changed = Object.fromEntries(Object.entries(change).filter(([k, v]) => before[k as keyof typeof before] !== v));
      await recordAudit(m, {
        shopId: auth.shopId,
        actor: auth,
        action: 'mold.update',
        objectType: 'mold',
        objectId: id,
        detail: { before, change: changed, reanalysed: reread },
      });
    });
    return this.get(auth.shopId, id);
  }

  async remove(auth: AuthContext, id: string): Promise<void> {
    await this.ds.transaction(async (m) => {
      const mold = await m.findOne(Mold, { where: { id, shopId: auth.shopId }, select: { id: true, name: true }, lock: { mode: 'pessimistic_write' } });
      if (!mold) throw notFound('mould');
      const plans = await plansUsingMold(m, auth.shopId, id);
      if (plans.length > 0) {
        const one = plans.length === 1;
        throw new AppError(
          'conflict',
          'mold_in_use',
          `“${mold.name}” is the cavity of the pour ${one ? 'plan' : 'plans'} ${namedList(plans)}, so it stays: delete ${one ? 'that plan' : 'those plans'}, or plan ${one ? 'it' : 'them'} with another mould or a quick shape, first.`,
        );
      }
      await m.delete(Mold, { id });
      await recordAudit(m, { shopId: auth.shopId, actor: auth, action: 'mold.delete', objectType: 'mold', objectId: id, detail: { name: mold.name } });
    });
  }

  async fill(shopId: string, id: string, q: { levelMm: number; from: LevelFrom; dam: Dam; withDepthMap: boolean }): Promise<MoldFill> {
    const model = await this.cache.model(this.ds.manager, shopId, id);
    const floorMm = floorOf(model, q.dam);
    const levelInMouldMm = inMouldFrame(q.levelMm, q.from, floorMm);
    const f = fillAt(model, levelInMouldMm, q.dam);
    if (!f.ok) throw new AppError('bad_request', f.error.code, f.error.message, { level: f.error.message });
    return {
      ...fillView(f.value, q.withDepthMap),
      levelMm: q.levelMm,
      levelFrom: q.from,
      floorMm,
      levelAboveFloorMm: q.from === 'floor' ? q.levelMm : aboveFloor(levelInMouldMm, floorMm),
      levelInMouldMm,
    };
  }

  async layers(shopId: string, id: string, q: { levelsMm: number[]; from: LevelFrom; dam: Dam }) {
    const model = await this.cache.model(this.ds.manager, shopId, id);
    const floorMm = floorOf(model, q.dam);
    const v = layerVolumes(
      model,
      q.levelsMm.map((l) => inMouldFrame(l, q.from, floorMm)),
      q.dam,
    );
    if (!v.ok) throw new AppError('bad_request', v.error.code, v.error.message, { levels: v.error.message });
    return { dam: q.dam, levelFrom: q.from, floorMm, layers: v.value.map((volumeMm3, i) => ({ fromMm: q.levelsMm[i]!, toMm: q.levelsMm[i + 1]!, volumeMm3 })) };
  }

  /** The pour plan's view of a mould's stored analysis (the same path the browser takes). */
  readonly cavityForPlan: MoldCavityLookup = {
    cavity: async (m: EntityManager, shopId, moldId, dam, levelAboveFloorMm) => {
      const model = await this.cache.model(m, shopId, moldId);
      const floor = floorOf(model, dam);
      const rim = model.analysis.bboxMm.max[2];
      if (!(levelAboveFloorMm > 0)) {
        throw new AppError(
          'unprocessable',
          'fill_below_floor',
          `The fill level ${levelAboveFloorMm} mm is not above the cavity floor: no resin would be poured; give the height of the resin surface above the floor.`,
        );
      }
      if (floor + levelAboveFloorMm > rim + 1e-9) {
        throw new AppError(
          'unprocessable',
          'fill_above_report',
          `The fill level ${levelAboveFloorMm} mm is above the top of the mould, ${aboveFloor(rim, floor)} mm above its cavity floor; choose a level inside the mould, or dam it higher and report again.`,
        );
      }
      const top = Math.min(rim, floor + levelAboveFloorMm);
      const facts = planCavityFacts(model, dam, floor, top);
      if (!facts.ok) throw new AppError('unprocessable', facts.error.code, facts.error.message);
      const planned = planCavityFromMold(facts.value, top);
      if (!planned.ok) throw new AppError('unprocessable', planned.error.code, planned.error.message);
      return planned.value;
    },
    floorMm: async (m: EntityManager, shopId, moldId, dam) => floorOf(await this.cache.model(m, shopId, moldId), dam),
  };
}

const summaryColumns = [
  'id',
  'shopId',
  'pieceId',
  'name',
  'fileName',
  'format',
  'units',
  'fileUnits',
  'upAxis',
  'sizeBytes',
  'sha256',
  'status',
  'progress',
  'errorCode',
  'errorMessage',
  'createdAt',
  'analysedAt',
] as const;
const summarySelect = Object.fromEntries(summaryColumns.map((c) => [c, true])) as Record<string, true>;
