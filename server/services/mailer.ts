import nodemailer from 'nodemailer'

export interface Mail {
  to: string
  subject: string
  text: string
  html: string
}

export interface Mailer {
  send(mail: Mail): Promise<void>
  close(): void
}

/** nodemailer over SMTP: SMTP_URL in production, the local sink otherwise. */
export function createMailer(smtpUrl: string, from: string): Mailer {
  const transport = nodemailer.createTransport(smtpUrl)
  return {
    async send(mail) {
      await transport.sendMail({ from, ...mail })
    },
    close: () => transport.close(),
  }
}

/** The sink speaks plain SMTP on loopback: no TLS to negotiate. */
export function sinkSmtpUrl(port: number): string {
  return `smtp://127.0.0.1:${port}/?ignoreTLS=true`
}
