import nodemailer, { type Transporter } from 'nodemailer'
import { useDb } from './db/connection'

// E-mail goes through nodemailer. Without SMTP_URL the transport only builds the message and
// we keep it in the `outbox` table, which admins read on the mailbox page (a local fake).
let transport: Transporter | undefined

function useTransport(): Transporter {
  if (!transport) {
    transport = process.env.SMTP_URL
      ? nodemailer.createTransport(process.env.SMTP_URL)
      : nodemailer.createTransport({ streamTransport: true, buffer: true, newline: 'unix' })
  }
  return transport
}

export interface Mail { to: string, subject: string, text: string }

export async function sendMail(mail: Mail): Promise<void> {
  const from = process.env.MAIL_FROM || 'Scalewright <no-reply@scalewright.invalid>'
  const info = await useTransport().sendMail({ from, ...mail })
  if (!process.env.SMTP_URL) {
    const raw = (info as unknown as { message: Buffer }).message.toString('utf8')
    await useDb()('outbox').insert({ to_address: mail.to, subject: mail.subject, text_body: mail.text, raw })
  }
}

/** The public address of the app for links in e-mails. */
export function appUrl(path: string): string {
  const base = (process.env.NUXT_PUBLIC_APP_URL || process.env.APP_URL || 'http://127.0.0.1:3000').replace(/\/$/, '')
  return `${base}${path}`
}
