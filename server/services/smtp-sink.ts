import type { AddressInfo } from 'node:net'
import { simpleParser, type AddressObject } from 'mailparser'
import { SMTPServer } from 'smtp-server'
import type { Logger } from 'pino'
import { OutboxMessage } from '../models'

export interface SmtpSink {
  port: number
  close(): Promise<void>
}

/** Every address of a To field, which mailparser gives as one object or a list. */
function addresses(field: AddressObject | AddressObject[] | undefined): string[] {
  const list = field === undefined ? [] : Array.isArray(field) ? field : [field]
  return list.flatMap((a) => a.value.map((v) => v.address ?? '')).filter(Boolean)
}

/**
 * A local SMTP server for development and tests: it accepts every message on
 * 127.0.0.1 and stores it in PostgreSQL for the admin Outbox. The SMTP reply
 * comes only after the row is written, so a sender that awaits delivery can
 * read the message at once.
 */
export async function startSmtpSink(port: number, logger: Logger): Promise<SmtpSink> {
  const server = new SMTPServer({
    authOptional: true,
    disabledCommands: ['STARTTLS', 'AUTH'],
    banner: 'Chimeline local mail sink',
    size: 10 * 1024 * 1024,
    logger: false,
    onData(stream, session, callback) {
      simpleParser(stream)
        .then(async (mail) => {
          const envelopeTo = session.envelope.rcptTo.map((r) => r.address)
          await OutboxMessage.create({
            from: mail.from?.text ?? (session.envelope.mailFrom ? session.envelope.mailFrom.address : ''),
            to: addresses(mail.to).length ? addresses(mail.to) : envelopeTo,
            subject: mail.subject ?? '',
            text: mail.text ?? '',
            html: typeof mail.html === 'string' ? mail.html : '',
          })
          callback()
        })
        .catch((err: Error) => {
          logger.error({ err }, 'SMTP sink could not store a message')
          callback(err)
        })
    },
  })
  await new Promise<void>((resolve, reject) => {
    server.once('error', reject)
    server.listen(port, '127.0.0.1', () => resolve())
  })
  const actual = (server.server.address() as AddressInfo).port
  return {
    port: actual,
    close: () => new Promise<void>((resolve) => server.close(() => resolve())),
  }
}
