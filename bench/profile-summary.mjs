// Summarises a .cpuprofile: self time by package and function, inclusive time by package and by
// api/src file, over the last 15 s of the profile (the load, not the boot). Used by profile-ingest.ts.
import fs from 'node:fs';
const dir = process.argv[2] ?? 'test-output/profiles';
const f = fs.readdirSync(dir).find((x) => x.endsWith('.cpuprofile'));
const p = JSON.parse(fs.readFileSync(dir + '/' + f));
const byId = new Map(p.nodes.map(n=>[n.id,n]));
const parent = new Map(); for (const n of p.nodes) for (const c of n.children||[]) parent.set(c, n.id);
let t = p.startTime; const from = p.endTime - 15e6;
const self = new Map(), pkg = new Map(), incl = new Map(); let total=0;
for (let i=0;i<p.samples.length;i++){ t += p.timeDeltas[i]; if (t < from) continue; const dt = p.timeDeltas[i+1] ?? 0; const n = byId.get(p.samples[i]); total += dt;
  const cf = n.callFrame; const key = `${cf.functionName||'(anon)'} ${cf.url.replace(/.*node_modules\//,'nm/').replace(/.*\/api\/(src|dist)\//,'api/')}:${cf.lineNumber}`;
  self.set(key,(self.get(key)||0)+dt);
  const m = /node_modules\/((@[^/]+\/)?[^/]+)/.exec(cf.url); const k2 = m ? m[1] : (/\/api\/(src|dist)\//.test(cf.url) ? 'api/src' : cf.url.startsWith('node:') ? cf.url.split('/')[0] : (cf.functionName || cf.url || '(native)'));
  pkg.set(k2,(pkg.get(k2)||0)+dt);
  // inclusive by package along the stack (once per package)
  const seen = new Set(); let id = n.id; while (id) { const nn = byId.get(id); const mm = /node_modules\/((@[^/]+\/)?[^/]+)/.exec(nn.callFrame.url); const kk = mm ? mm[1] : (/\/api\/(src|dist)\//.test(nn.callFrame.url) ? 'api/src:'+nn.callFrame.url.replace(/.*\/api\/(src|dist)\//,'') : null); if (kk && !seen.has(kk)) { seen.add(kk); incl.set(kk,(incl.get(kk)||0)+dt);} id = parent.get(id); }
}
const top = (m,n)=>[...m].sort((a,b)=>b[1]-a[1]).slice(0,n).map(([k,v])=>`${(100*v/total).toFixed(1).padStart(5)}% ${k}`).join('\n');
console.log('window ms', total/1000); console.log('--- self by package'); console.log(top(pkg,22)); console.log('--- self top functions'); console.log(top(self,25)); console.log('--- inclusive api/src files'); console.log(top(new Map([...incl].filter(([k])=>k.startsWith('api/src'))),20));
console.log('--- inclusive packages'); console.log(top(new Map([...incl].filter(([k])=>!k.startsWith('api/src'))),20));
