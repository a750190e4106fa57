import { X509Certificate } from 'node:crypto';
import { dirname, resolve } from 'node:path';
import { buildClientWhenStale } from './client-build';
import { readEnv } from './env';
import { lanNames } from './lan/lan-addresses';
import { ensureLanCertificate } from './lan/lan-certificate';
import { lanUrls, lanUrlsText } from './lan/lan-urls';
import { startGripline } from './main';
import { stopOnSignals } from './stop-on-signals';

/**
 * `npm run start:lan`: Gripline over HTTPS for phones on the hangar network, on a certificate it makes
 * for this machine and keeps beside the database.
 */
buildClientWhenStale();
const env = readEnv();
if (env.TLS_CERT_FILE) {
  console.error('npm run start:lan makes and uses its own certificate; to serve TLS_CERT_FILE and TLS_KEY_FILE, use npm start.');
  process.exit(1);
}
const names = lanNames();
const certificate = await ensureLanCertificate({ dir: dirname(resolve(env.DATABASE_PATH)), ...names });
for (const what of certificate.made) console.log(`Made ${what}.`);

const running = await startGripline(env, { lanCertificate: certificate, urlHost: names.ipv4[0] ?? names.hostNames[0] });
const served = new X509Certificate(certificate.cert);
console.log(await lanUrlsText(lanUrls(names, running.port, (ip) => served.checkIP(ip) !== undefined)));
stopOnSignals(running);
