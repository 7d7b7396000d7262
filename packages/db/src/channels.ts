/** PostgreSQL NOTIFY channels between the API instances and the workers. */
export const OUTBOUND_MAIL_CHANNEL = 'gelpoint_outbound_mail';
export const MOLD_ANALYSIS_CHANNEL = 'gelpoint_mold_analysis';
/** Every change of a mould's analysis status or progress, from a trigger: `{id, status, progress, errorCode, errorMessage}` as JSON. */
export const MOLD_PROGRESS_CHANNEL = 'gelpoint_mold_progress';
