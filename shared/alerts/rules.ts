// The alert rules Coldknit knows, what each watches, and how grave each kind of finding is.

export const ALERT_RULES = ['freeze_risk', 'out_of_band', 'storage_warm', 'silent_logger', 'exposure_budget'] as const;
export type AlertRule = (typeof ALERT_RULES)[number];

/** A warning asks for a look today; critical asks for action now. */
export const SEVERITIES = ['warning', 'critical'] as const;
export type Severity = (typeof SEVERITIES)[number];

export const SEVERITY_RANK: Record<Severity, number> = { warning: 1, critical: 2 };

/** What an alert is about: a room (freeze, too warm), a batch (band, budget) or a logger (silent). */
export type SubjectKind = 'room' | 'batch' | 'logger';

export const RULE_SUBJECT: Record<AlertRule, SubjectKind> = {
  freeze_risk: 'room',
  out_of_band: 'batch',
  storage_warm: 'room',
  silent_logger: 'logger',
  exposure_budget: 'batch',
};

/** Short names for lists, subjects and the settings page. */
export const RULE_TITLES: Record<AlertRule, string> = {
  freeze_risk: 'Freeze risk',
  out_of_band: 'Outside the band',
  storage_warm: 'Too warm for cold storage',
  silent_logger: 'Logger silent',
  exposure_budget: 'Exposure budget spent',
};
