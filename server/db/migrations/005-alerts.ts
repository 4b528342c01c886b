import type { QueryInterface } from 'sequelize';

// Raw SQL: two tables need generated columns behind their unique keys, which createTable cannot declare.
const TABLES = [
  // Thresholds as stored overrides (JSON); one row for the nursery (room_id NULL) and at most one per room.
  // scope_room_id folds NULL into 0 so the unique key also holds for the nursery row (NULLs never collide).
  `CREATE TABLE alert_settings (
    id INT UNSIGNED NOT NULL AUTO_INCREMENT PRIMARY KEY,
    nursery_id INT UNSIGNED NOT NULL,
    room_id INT UNSIGNED NULL,
    scope_room_id INT UNSIGNED AS (IFNULL(room_id, 0)) STORED,
    thresholds LONGTEXT NOT NULL,
    updated_by INT UNSIGNED NULL,
    created_at DATETIME(3) NOT NULL,
    updated_at DATETIME(3) NOT NULL,
    UNIQUE KEY alert_settings_scope (nursery_id, scope_room_id),
    CONSTRAINT alert_settings_nursery FOREIGN KEY (nursery_id) REFERENCES nurseries (id) ON DELETE CASCADE,
    CONSTRAINT alert_settings_room FOREIGN KEY (room_id) REFERENCES rooms (id) ON DELETE CASCADE,
    CONSTRAINT alert_settings_user FOREIGN KEY (updated_by) REFERENCES users (id) ON DELETE SET NULL
  ) ENGINE=InnoDB`,
  // One row per alert. open_key is set while the alert is not resolved, so the unique key allows one open
  // alert per (rule, subject) in a nursery even when two app instances evaluate at once.
  `CREATE TABLE alerts (
    id INT UNSIGNED NOT NULL AUTO_INCREMENT PRIMARY KEY,
    nursery_id INT UNSIGNED NOT NULL,
    rule VARCHAR(32) NOT NULL,
    subject_kind VARCHAR(10) NOT NULL,
    subject_id INT UNSIGNED NOT NULL,
    subject_name VARCHAR(250) NOT NULL,
    room_id INT UNSIGNED NULL,
    severity ENUM('warning', 'critical') NOT NULL,
    status ENUM('open', 'acknowledged', 'resolved') NOT NULL,
    since DATETIME(3) NULL,
    opened_at DATETIME(3) NOT NULL,
    acknowledged_at DATETIME(3) NULL,
    acknowledged_by INT UNSIGNED NULL,
    resolved_at DATETIME(3) NULL,
    resolution VARCHAR(20) NULL,
    last_notified_at DATETIME(3) NULL,
    reminders_sent INT UNSIGNED NOT NULL DEFAULT 0,
    detail LONGTEXT NOT NULL,
    checked_at DATETIME(3) NOT NULL,
    created_at DATETIME(3) NOT NULL,
    updated_at DATETIME(3) NOT NULL,
    open_key VARCHAR(80) AS (IF(status = 'resolved', NULL, CONCAT(rule, ':', subject_kind, ':', subject_id))) STORED,
    UNIQUE KEY alerts_one_open (nursery_id, open_key),
    KEY alerts_nursery_status (nursery_id, status, id),
    KEY alerts_room (room_id, id),
    CONSTRAINT alerts_nursery FOREIGN KEY (nursery_id) REFERENCES nurseries (id) ON DELETE CASCADE,
    CONSTRAINT alerts_room FOREIGN KEY (room_id) REFERENCES rooms (id) ON DELETE SET NULL,
    CONSTRAINT alerts_ack_user FOREIGN KEY (acknowledged_by) REFERENCES users (id) ON DELETE SET NULL
  ) ENGINE=InnoDB`,
  // Who was told an alert opened: reminders and the resolved message go to them.
  `CREATE TABLE alert_recipients (
    alert_id INT UNSIGNED NOT NULL,
    user_id INT UNSIGNED NOT NULL,
    notified_at DATETIME(3) NOT NULL,
    PRIMARY KEY (alert_id, user_id),
    CONSTRAINT alert_recipients_alert FOREIGN KEY (alert_id) REFERENCES alerts (id) ON DELETE CASCADE,
    CONSTRAINT alert_recipients_user FOREIGN KEY (user_id) REFERENCES users (id) ON DELETE CASCADE
  ) ENGINE=InnoDB`,
  // A user's choice per rule (and for the digest); no row means the role's default.
  `CREATE TABLE alert_subscriptions (
    user_id INT UNSIGNED NOT NULL,
    topic VARCHAR(32) NOT NULL,
    level ENUM('all', 'critical', 'off') NOT NULL,
    created_at DATETIME(3) NOT NULL,
    updated_at DATETIME(3) NOT NULL,
    PRIMARY KEY (user_id, topic),
    CONSTRAINT alert_subscriptions_user FOREIGN KEY (user_id) REFERENCES users (id) ON DELETE CASCADE
  ) ENGINE=InnoDB`,
  // Every message is written here in the same transaction as the change it reports, then delivered by the sender.
  // message_id is fixed when the row is written, so a resend after a crash carries the same Message-ID.
  `CREATE TABLE outbox (
    id INT UNSIGNED NOT NULL AUTO_INCREMENT PRIMARY KEY,
    nursery_id INT UNSIGNED NOT NULL,
    kind VARCHAR(20) NOT NULL,
    user_id INT UNSIGNED NULL,
    to_address VARCHAR(190) NOT NULL,
    subject VARCHAR(300) NOT NULL,
    text_body MEDIUMTEXT NOT NULL,
    html_body MEDIUMTEXT NOT NULL,
    message_id VARCHAR(200) NOT NULL,
    alert_ids LONGTEXT NOT NULL,
    status ENUM('pending', 'sent', 'failed') NOT NULL DEFAULT 'pending',
    attempts INT UNSIGNED NOT NULL DEFAULT 0,
    next_attempt_at DATETIME(3) NOT NULL,
    claimed_by VARCHAR(80) NULL,
    claimed_until DATETIME(3) NULL,
    last_error TEXT NULL,
    sent_at DATETIME(3) NULL,
    created_at DATETIME(3) NOT NULL,
    updated_at DATETIME(3) NOT NULL,
    UNIQUE KEY outbox_message_id (message_id),
    KEY outbox_due (status, next_attempt_at),
    KEY outbox_claim (claimed_by),
    CONSTRAINT outbox_nursery FOREIGN KEY (nursery_id) REFERENCES nurseries (id) ON DELETE CASCADE,
    CONSTRAINT outbox_user FOREIGN KEY (user_id) REFERENCES users (id) ON DELETE SET NULL
  ) ENGINE=InnoDB`,
  // One digest per nursery per local day: the key makes a second instance's attempt a no-op.
  `CREATE TABLE alert_digests (
    nursery_id INT UNSIGNED NOT NULL,
    local_date DATE NOT NULL,
    created_at DATETIME(3) NOT NULL,
    PRIMARY KEY (nursery_id, local_date),
    CONSTRAINT alert_digests_nursery FOREIGN KEY (nursery_id) REFERENCES nurseries (id) ON DELETE CASCADE
  ) ENGINE=InnoDB`,
];

export async function up(qi: QueryInterface): Promise<void> {
  for (const sql of TABLES) await qi.sequelize.query(sql);
}

export async function down(qi: QueryInterface): Promise<void> {
  for (const table of ['alert_digests', 'outbox', 'alert_subscriptions', 'alert_recipients', 'alerts', 'alert_settings']) {
    await qi.dropTable(table);
  }
}
