import type { MoldFileUnits, MoldView, UpAxis, UpdateMoldRequest } from '../types';

export interface MoldSettingsValues {
  name: string;
  /** '' for no piece. */
  pieceId: string;
  units: MoldFileUnits;
  upAxis: UpAxis;
}

export function settingsOf(mold: Pick<MoldView, 'name' | 'pieceId' | 'units' | 'upAxis'>): MoldSettingsValues {
  return { name: mold.name, pieceId: mold.pieceId ?? '', units: mold.units, upAxis: mold.upAxis };
}

/** Only what differs from the mould as it is, so an unchanged frame is never read again. */
export function moldChanges(mold: Pick<MoldView, 'name' | 'pieceId' | 'units' | 'upAxis'>, values: MoldSettingsValues): UpdateMoldRequest {
  const changes: UpdateMoldRequest = {};
  const name = values.name.trim();
  if (name !== mold.name) changes.name = name;
  const pieceId = values.pieceId === '' ? null : values.pieceId;
  if (pieceId !== mold.pieceId) changes.pieceId = pieceId;
  if (values.units !== mold.units) changes.units = values.units;
  if (values.upAxis !== mold.upAxis) changes.upAxis = values.upAxis;
  return changes;
}

/** Whether saving these changes reads the file again, so the page can say so before it happens. */
export function rereads(changes: UpdateMoldRequest): boolean {
  return changes.units !== undefined || changes.upAxis !== undefined;
}
