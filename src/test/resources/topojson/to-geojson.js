const topojson = require('./package/dist/topojson-client.js');
const fs = require('fs');
const t = JSON.parse(fs.readFileSync(process.argv[2]));
const fc = topojson.feature(t, t.objects[process.argv[3]]);
fs.writeFileSync(process.argv[4], JSON.stringify(fc));
