import nodemailer, { type Transporter } from 'nodemailer'
import type { Knex } from 'knex'
import { useDb } from './db/connection'
import { fail } from './http/apiHandler'

// E-mail goes through nodemailer. Without SMTP_URL the transport only builds the message and
// we keep it in the `outbox` table, which admins read on the mailbox page (a local fake).
let transport: Transporter | undefined

function useTransport(): Transporter {
  if (!transport) {
    transport = process.env.SMTP_URL ? nodemailer.createTransport(process.env.SMTP_URL) : nodemailer.createTransport({ streamTransport: true, buffer: true, newline: 'unix' })
  }
  return transport
}

export interface Mail {
  to: string
  subject: string
  text: string
}

// Subjects are one line and short: names in them (groups, people) may be long or hold line
// breaks, and the outbox keeps at most 200 characters.
export const MAX_SUBJECT = 150

/** A subject on one line, cut at MAX_SUBJECT characters with an ellipsis. */
export function subjectLine(subject: string): string {
  const line = subject.replace(/\s+/g, ' ').trim()
  return line.length <= MAX_SUBJECT ? line : `${line.slice(0, MAX_SUBJECT - 1).trimEnd()}…`
}

/**
 * Send a mail. Pass the transaction that records what the mail announces (an invitation, a
 * reset link) as `db`: the outbox row is written in it, and a mail that cannot be sent throws
 * (503 with `failure` as its message), which rolls the transaction back — nothing is left
 * announced but unsent.
 */
export async function sendMail(mail: Mail, opts: { db?: Knex; failure?: string } = {}): Promise<void> {
  const from = process.env.MAIL_FROM || 'Scalewright <no-reply@scalewright.invalid>'
  const message = { ...mail, subject: subjectLine(mail.subject) }
  try {
    const info = await useTransport().sendMail({ from, ...message })
    if (!process.env.SMTP_URL) {
      const raw = (info as unknown as { message: Buffer }).message.toString('utf8')
      await (opts.db ?? useDb())('outbox').insert({ to_address: message.to, subject: message.subject, text_body: message.text, raw })
    }
  } catch (error) {
    console.error('[mail] not sent', error)
    fail(503, opts.failure ?? 'The mail could not be sent, so nothing was changed; try again later')
  }
}

/** The public address of the app for links in e-mails. */
export function appUrl(path: string): string {
  const base = (process.env.NUXT_PUBLIC_APP_URL || process.env.APP_URL || 'http://127.0.0.1:3000').replace(/\/$/, '')
  return `${base}${path}`
}
