// A small document model for our messages, rendered to a plain-text part and an HTML part from the same content.
import { escapeHtml } from '../../mail/escapeHtml';

export interface MailSection {
  heading: string;
  tag?: string;
  facts?: [label: string, value: string][];
  lists?: { title: string; items: string[] }[];
  table?: { caption: string; columns: string[]; rows: string[][] };
  links?: { label: string; href: string }[];
}

export interface MailDocument {
  title: string;
  intro: string[];
  sections: MailSection[];
  footer: string[];
}

const RULE = '-'.repeat(60);

function sectionText(s: MailSection): string[] {
  const lines = [RULE, s.tag ? `${s.heading}  [${s.tag}]` : s.heading, ''];
  for (const [label, value] of s.facts ?? []) lines.push(`${`${label}:`.padEnd(11)}${value}`);
  for (const list of s.lists ?? []) {
    lines.push('', `${list.title}:`, ...list.items.map((item) => `  - ${item}`));
  }
  if (s.table) {
    const widths = s.table.columns.map((c, i) => Math.max(c.length, ...s.table!.rows.map((r) => r[i].length)));
    const row = (cells: string[]) => cells.map((cell, i) => cell.padEnd(widths[i])).join('  ').trimEnd();
    lines.push(s.table.caption, row(s.table.columns), ...s.table.rows.map(row));
  }
  if (s.links?.length) lines.push('', ...s.links.map((l) => `${l.label}: ${l.href}`));
  lines.push('');
  return lines;
}

export function renderText(doc: MailDocument): string {
  return [doc.title, '', ...doc.intro, '', ...doc.sections.flatMap(sectionText), RULE, ...doc.footer, ''].join('\n');
}

// Inline styles only: many mail clients drop <style> blocks. Colours are Coldknit's slate and ember.
const STYLE = {
  body: 'font-family:Arial,Helvetica,sans-serif;color:#1d2a33;line-height:1.45;max-width:640px',
  section: 'border-top:3px solid #34566b;padding:12px 0;margin-top:12px',
  tag: 'display:inline-block;background:#fbe6dc;color:#7a2e12;border-radius:4px;padding:1px 6px;font-size:13px;font-weight:bold',
  label: 'text-align:left;vertical-align:top;padding:2px 12px 2px 0;color:#4c5d68;white-space:nowrap',
  cell: 'text-align:left;padding:2px 10px 2px 0;border-bottom:1px solid #dfe8ee',
  caution: 'background:#fff6e0;border-left:4px solid #c77b00;padding:6px 10px',
};

function sectionHtml(s: MailSection): string {
  const parts = [`<div style="${STYLE.section}">`, `<h2 style="font-size:18px;margin:0 0 6px">${escapeHtml(s.heading)}</h2>`];
  if (s.tag) parts.push(`<p style="margin:0 0 8px"><span style="${STYLE.tag}">${escapeHtml(s.tag)}</span></p>`);
  if (s.facts?.length) {
    const rows = s.facts.map(([label, value]) => `<tr><th scope="row" style="${STYLE.label}">${escapeHtml(label)}</th><td>${escapeHtml(value)}</td></tr>`);
    parts.push(`<table role="presentation" style="border-collapse:collapse">${rows.join('')}</table>`);
  }
  for (const list of s.lists ?? []) {
    const boxed = /caution/i.test(list.title);
    parts.push(
      `<div${boxed ? ` style="${STYLE.caution}"` : ''}><p style="margin:10px 0 4px;font-weight:bold">${escapeHtml(list.title)}</p>`,
      `<ul style="margin:0;padding-left:20px">${list.items.map((i) => `<li>${escapeHtml(i)}</li>`).join('')}</ul></div>`,
    );
  }
  if (s.table) {
    const head = s.table.columns.map((c) => `<th scope="col" style="${STYLE.cell}">${escapeHtml(c)}</th>`).join('');
    const body = s.table.rows.map((r) => `<tr>${r.map((cell) => `<td style="${STYLE.cell}">${escapeHtml(cell)}</td>`).join('')}</tr>`).join('');
    parts.push(`<table style="border-collapse:collapse"><caption style="text-align:left;font-weight:bold">${escapeHtml(s.table.caption)}</caption><thead><tr>${head}</tr></thead><tbody>${body}</tbody></table>`);
  }
  if (s.links?.length) {
    parts.push(`<p style="margin:10px 0 0">${s.links.map((l) => `<a href="${escapeHtml(l.href)}" style="color:#34566b;font-weight:bold">${escapeHtml(l.label)}</a>`).join(' &middot; ')}</p>`);
  }
  parts.push('</div>');
  return parts.join('');
}

export function renderHtml(doc: MailDocument): string {
  return [
    '<!doctype html><html><head><meta charset="utf-8"><meta name="viewport" content="width=device-width">',
    `<title>${escapeHtml(doc.title)}</title></head><body style="${STYLE.body}">`,
    `<h1 style="font-size:22px;color:#22394a">${escapeHtml(doc.title)}</h1>`,
    ...doc.intro.map((p) => `<p>${escapeHtml(p)}</p>`),
    ...doc.sections.map(sectionHtml),
    `<div style="border-top:1px solid #dfe8ee;margin-top:16px;font-size:13px;color:#4c5d68">${doc.footer.map((p) => `<p>${escapeHtml(p)}</p>`).join('')}</div>`,
    '</body></html>',
  ].join('\n');
}
