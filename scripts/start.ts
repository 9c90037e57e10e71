// `npm start`: after the build (run by the npm script), serve the add-in and the preview workbook
// on localhost and say how to use each. Runs until Ctrl-C.
import { readFileSync } from 'node:fs';
import { join } from 'node:path';
import { devCertificates, startServer } from './staticServer';

const ROOT = join(__dirname, '..');
const DIST = join(ROOT, 'dist');
const PORT = Number(process.env.PORT ?? 3000);

function functionNames(): string[] {
  const metadata = JSON.parse(readFileSync(join(DIST, 'functions.json'), 'utf8')) as { functions: { id: string }[] };
  return metadata.functions.map((f) => `PLUMB.${f.id}`);
}

function excelInstructions(https: boolean): string[] {
  const lines = [
    'In Excel (the add-in must be served over https on port 3000):',
    '  Excel desktop, Windows or Mac:  npx office-addin-debugging start manifest.xml',
    '  Excel on the web:              Insert > Add-ins > Upload My Add-in, then choose manifest.xml',
  ];
  lines.push('  For colleagues, build for your own https host instead: PLUMB_ORIGIN=https://host/path npm run build (README, "Deploy for your team").');
  if (!https) {
    lines.push('  No development certificate was found, so this server speaks plain http, which Excel refuses.');
    lines.push('  Make one with `npx office-addin-dev-certs install`, then run `npm start` again.');
  }
  return lines;
}

async function main(): Promise<void> {
  const https = devCertificates() !== undefined;
  try {
    const running = await startServer(DIST, PORT, true);
    console.log(`\nPlumbline is being served at ${running.origin}/ (cell functions: ${functionNames().join(', ')})\n`);
    console.log(['Without Excel: open the preview workbook with the demo batch log and live formulas:', `  ${running.origin}/preview.html`, ''].join('\n'));
    console.log(excelInstructions(https).join('\n'));
    console.log('\nPress Ctrl-C to stop.');
    process.on('SIGINT', () => {
      void running.close().then(() => process.exit(0));
    });
  } catch (error) {
    if ((error as NodeJS.ErrnoException).code === 'EADDRINUSE') {
      console.error(`Port ${PORT} is already in use (perhaps another \`npm start\`). Stop that process, or choose another port: PORT=3100 npm start`);
    } else {
      console.error(`Could not start the server: ${(error as Error).message}`);
    }
    process.exitCode = 1;
  }
}

void main();
