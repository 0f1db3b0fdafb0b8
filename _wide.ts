import { chromium } from 'playwright-core';
import { serveStatic } from './src/catalog/serve/staticServer.ts';
const srv = await serveStatic('dist', '/');
const b = await chromium.launch({ executablePath: '/usr/bin/chromium' });
const p = await b.newPage({ viewport: { width: 390, height: 800 } });
for (const path of ['methods/', '', 'readings/', 'objects/', 'query/', 'place/']) {
  await p.goto(srv.url + path);
  await p.waitForTimeout(800);
  const r = await p.evaluate(() => {
    const out: string[] = [];
    for (const el of Array.from(document.querySelectorAll('body *'))) {
      const rect = (el as HTMLElement).getBoundingClientRect();
      if (rect.right > 392 && (el as HTMLElement).offsetParent !== null) out.push(`${el.tagName}.${(el as HTMLElement).className} right=${Math.round(rect.right)} w=${Math.round(rect.width)} ${(el.textContent ?? '').slice(0, 50).replace(/\s+/g, ' ')}`);
    }
    return { sw: document.documentElement.scrollWidth, out: out.slice(0, 6) };
  });
  console.log(path, r.sw, r.out);
}
await b.close(); await srv.close();
