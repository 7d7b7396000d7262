/** PostgreSQL NOTIFY channels shared by the API (which notifies) and the worker (which listens). */
export const OUTBOUND_MAIL_CHANNEL = 'gelpoint_outbound_mail';
export const MOLD_ANALYSIS_CHANNEL = 'gelpoint_mold_analysis';
