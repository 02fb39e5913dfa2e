// Development mail catcher: `node --import tsx api/mail/run-mail-fake.ts [port] [folder]` accepts all
// mail on 127.0.0.1 and keeps each message as an .eml file, printing who it was for and its subject.
import { startMailFake } from './mail-fake';

const port = Number(process.argv[2] ?? 2525);
const folder = process.argv[3] ?? '.data/mail';
const fake = await startMailFake({ port, folder });
console.log(`[lobewright] mail catcher on ${fake.url}; messages are kept in ${folder}`);
let seen = 0;
setInterval(() => {
  for (const m of fake.messages.slice(seen)) console.log(`[lobewright] mail to ${m.to.join(', ')}: ${m.subject}`);
  seen = fake.messages.length;
}, 500);
process.on('SIGTERM', () => void fake.stop().then(() => process.exit(0)));
process.on('SIGINT', () => void fake.stop().then(() => process.exit(0)));
