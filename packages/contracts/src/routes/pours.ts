import { z } from 'zod';
import { Id } from '../common';
import { Warning } from '../molds';
import {
  AddReadingsRequest,
  BatchParams,
  BatchView,
  CsvImportQuery,
  CureCheckFields,
  CureCheckView,
  IngestReadingsRequest,
  IngestToken,
  LogBatchRequest,
  MachinedRequest,
  PourList,
  PourListQuery,
  PourView,
  ReadingList,
  ReadingParams,
  ReadingsAdded,
  ReadingView,
  ReminderView,
  StartPourRequest,
  TodayView,
  VoidRequest,
} from '../pours';
import { IdParams, route } from './route';

export const CureCheckParams = z.object({ id: Id, checkId: Id });
export const LoggedBatch = z.object({ batch: BatchView, warnings: z.array(Warning) });

export const pourRoutes = {
  listPours: route({ method: 'get', path: '/pours', tag: 'pours', summary: 'The cure board: pours with their stage, progress and next event', access: 'member', query: PourListQuery, response: PourList }),
  startPour: route({ method: 'post', path: '/pours', tag: 'pours', summary: 'Start pouring a plan', access: 'member', body: StartPourRequest, response: PourView, status: 201, idempotent: true }),
  getPour: route({ method: 'get', path: '/pours/:id', tag: 'pours', summary: 'A pour: batches, readings, checks, cure status and reminders', access: 'member', params: IdParams, response: PourView }),
  logBatch: route({ method: 'post', path: '/pours/:id/batches', tag: 'pours', summary: 'Log a mixed batch: lots, weighed grams, temperatures, humidity', access: 'member', params: IdParams, body: LogBatchRequest, response: LoggedBatch, status: 201, idempotent: true }),
  addReadings: route({
    method: 'post',
    path: '/pours/:id/readings',
    tag: 'pours',
    summary: 'Add temperature readings (all or none; unusual values need confirmUnusual)',
    access: 'member',
    params: IdParams,
    body: AddReadingsRequest,
    response: ReadingsAdded,
    idempotent: true,
  }),
  listReadings: route({ method: 'get', path: '/pours/:id/readings', tag: 'pours', summary: 'Every reading of a pour, with who logged it and how, voided ones included', access: 'member', params: IdParams, response: ReadingList }),
  voidReading: route({
    method: 'delete',
    path: '/pours/:id/readings/:readingId',
    tag: 'pours',
    summary: 'Void a reading with a reason (the logger or a lead); it stays in the history, out of the cure',
    access: 'member',
    params: ReadingParams,
    body: VoidRequest,
    response: ReadingView,
  }),
  voidBatch: route({
    method: 'post',
    path: '/pours/:id/batches/:batchId/void',
    tag: 'pours',
    summary: 'Void a logged cup with a reason (the person who mixed it or a lead); its grams go back to the lots',
    access: 'member',
    params: BatchParams,
    body: VoidRequest,
    response: BatchView,
  }),
  importReadingsCsv: route({
    method: 'post',
    path: '/pours/:id/readings/csv',
    tag: 'pours',
    summary: 'Import a time,tempC (or time,tempF) log (text/csv): all rows or none',
    access: 'member',
    params: IdParams,
    query: CsvImportQuery,
    response: ReadingsAdded,
    idempotent: true,
  }),
  addCureCheck: route({ method: 'post', path: '/pours/:id/checks', tag: 'pours', summary: 'Record a cure check (multipart: stage, hardnessShoreD, note, optional photo)', access: 'member', params: IdParams, body: CureCheckFields, response: CureCheckView, status: 201, idempotent: true }),
  cureCheckPhoto: route({ method: 'get', path: '/pours/:id/checks/:checkId/photo', tag: 'pours', summary: "A cure check's photo", access: 'member', params: CureCheckParams, raw: true }),
  releasePour: route({ method: 'post', path: '/pours/:id/release', tag: 'pours', summary: 'Release the piece for machining (only when the logged cure says it is ready)', access: 'pour:release', params: IdParams, response: PourView }),
  markMachined: route({ method: 'post', path: '/pours/:id/machined', tag: 'pours', summary: 'Mark the piece machined and schedule its finish coats', access: 'pour:machined', params: IdParams, body: MachinedRequest, response: PourView }),
  today: route({ method: 'get', path: '/today', tag: 'pours', summary: 'What is due in the next 24 hours, and what is overdue and not done', access: 'member', response: TodayView }),
  markReminderDone: route({ method: 'post', path: '/reminders/:id/done', tag: 'pours', summary: 'Mark a reminder done (any member; who and when are kept)', access: 'member', params: IdParams, response: ReminderView, idempotent: true }),
  issueIngestToken: route({ method: 'post', path: '/shop/ingest-token', tag: 'pours', summary: 'Issue a new token for the shop thermometer (the old one stops working); shown once', access: 'shop:manage', response: IngestToken, status: 201 }),
  ingestReadings: route({ method: 'post', path: '/ingest/readings', tag: 'pours', summary: 'A shop thermometer posts readings with the X-Gelpoint-Ingest-Token header', access: 'public', body: IngestReadingsRequest, response: ReadingsAdded, status: 202 }),
};

export const pourExportRoutes = {
  batchesCsv: route({ method: 'get', path: '/pours/:id/batches.csv', tag: 'pours', summary: "A pour's batches as CSV (text/csv): lots, target and weighed grams, temperatures, humidity, who and when (ISO 8601 UTC)", access: 'member', params: IdParams, raw: true }),
  readingsCsv: route({ method: 'get', path: '/pours/:id/readings.csv', tag: 'pours', summary: "A pour's temperature readings as CSV (text/csv): takenAt (ISO 8601 UTC), tempC, source", access: 'member', params: IdParams, raw: true }),
};
