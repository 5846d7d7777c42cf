/** Starts every local stand-in for a hosted service and says how the app reaches them. */
import path from "node:path";
import { startSmtpFake, type SmtpFake } from "./smtp/smtp-fake";
import { startS3Fake, type S3Fake } from "./s3/s3-fake";
import { startOpenMeteoFake } from "./open-meteo/server";

export type Fakes = {
  smtp: SmtpFake;
  s3: S3Fake;
  weather: Awaited<ReturnType<typeof startOpenMeteoFake>>;
  /** Environment variables pointing the app at the fakes. */
  env: Record<string, string>;
  close(): Promise<void>;
};

export type FakePorts = { smtp?: number; smtpHttp?: number; s3?: number; weather?: number };

export async function startAllFakes(options: { dataDir: string; ports?: FakePorts; bucket?: string }): Promise<Fakes> {
  const ports = options.ports ?? {};
  const bucket = options.bucket ?? "hatchway-documents";
  const smtp = await startSmtpFake({ smtpPort: ports.smtp, httpPort: ports.smtpHttp });
  const s3 = await startS3Fake({ port: ports.s3, directory: path.join(options.dataDir, "s3"), bucket });
  const weather = await startOpenMeteoFake({ port: ports.weather });
  return {
    smtp,
    s3,
    weather,
    env: {
      SMTP_URL: smtp.smtpUrl,
      MAIL_FAKE_INBOX_URL: smtp.inboxUrl,
      S3_ENDPOINT: s3.endpoint,
      S3_BUCKET: bucket,
      S3_ACCESS_KEY_ID: "S3RVER",
      S3_SECRET_ACCESS_KEY: "S3RVER",
      WEATHER_URL: weather.url,
      WEATHER_FAKE_CONTROL_URL: weather.controlUrl,
    },
    async close() {
      await Promise.allSettled([smtp.close(), s3.close(), weather.close()]);
    },
  };
}
