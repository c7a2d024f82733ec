// Reference classes from simple-statistics ckmeans (Wang & Song 2011 exact 1-D k-means).
const ss = require('simple-statistics');
const fs = require('fs');
let seed = 20240917;
function rnd() { seed = (seed * 1103515245 + 12345) % 2147483648; return seed / 2147483648; }
function normal() { return Math.sqrt(-2 * Math.log(1 - rnd())) * Math.cos(2 * Math.PI * rnd()); }
const cases = [];
cases.push({name: 'lognormal-200', k: 5, values: Array.from({length: 200}, () => +(Math.exp(1 + 0.8 * normal())).toFixed(3))});
cases.push({name: 'mixture-1000', k: 7, values: Array.from({length: 1000}, () => {
  const c = Math.floor(rnd() * 4); return +([10, 25, 60, 140][c] + [2, 5, 9, 20][c] * normal()).toFixed(2); })});
cases.push({name: 'integer-ties-300', k: 6, values: Array.from({length: 300}, () => Math.floor(Math.pow(rnd(), 2) * 31))});
let out = '';
for (const c of cases) {
  const clusters = ss.ckmeans(c.values, c.k);
  out += 'case ' + c.name + '\nclasses ' + c.k + '\nvalues ' + c.values.join(' ') + '\n';
  out += 'clusterMinima ' + clusters.map(cl => cl[0]).join(' ') + '\n';
  out += 'clusterSizes ' + clusters.map(cl => cl.length).join(' ') + '\n';
}
fs.writeFileSync('ckmeans-reference.txt', out);
console.log(out.split('\n').filter(l => !l.startsWith('values')).join('\n'));
