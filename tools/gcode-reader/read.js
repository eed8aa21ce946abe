// Test-only: reads one G-code program with gcode-toolpath and prints every move as one JSON document
// {units, moves: [{motion, spindle, from, to, centre?}]} with coordinates in millimetres (the reader's unit).
'use strict';
const fs = require('fs');
const Toolpath = require('gcode-toolpath');

const file = process.argv[2];
const moves = [];
let imperial = false;
const point = (v) => [v.x, v.y, v.z];
const toolpath = new Toolpath({
  addLine: (modal, v1, v2) => {
    imperial = imperial || modal.units === 'G20';
    moves.push({ motion: modal.motion, spindle: modal.spindle, from: point(v1), to: point(v2) });
  },
  addArcCurve: (modal, v1, v2, v0) => {
    imperial = imperial || modal.units === 'G20';
    moves.push({ motion: modal.motion, spindle: modal.spindle, from: point(v1), to: point(v2), centre: point(v0) });
  }
});
toolpath.loadFromString(fs.readFileSync(file, 'utf8'), (err) => {
  if (err) {
    console.error(String(err));
    process.exit(1);
  }
  process.stdout.write(JSON.stringify({ units: imperial ? 'G20' : 'G21', moves: moves }) + '\n');
});
