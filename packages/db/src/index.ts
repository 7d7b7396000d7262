export * from './entities';
export { createDataSource, connectDataSource, type DataSourceOptions } from './data-source';
export { databaseUrl } from './config';
export { hashPassword, verifyPassword, verifyAgainstNothing } from './passwords';
export { demoSignIns, DEMO_PASSWORD } from './seed/demo-people';
export { MOLD_ANALYSIS_CHANNEL, MOLD_PROGRESS_CHANNEL, OUTBOUND_MAIL_CHANNEL } from './channels';
export { queueMail, mailDomainOf, type MailToSend } from './outbound-mail';
export { storeMoldAnalysis, storeMoldRefusal, type FinishedMoldAnalysis } from './mold-analysis';
export { toCorePigment, toCoreResinSystem } from './shelf-values';
