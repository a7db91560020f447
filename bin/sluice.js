#!/usr/bin/env node
// The CLI lives in the committed bundle so that `npx sluice` needs no build step.
import '../dist/cli.js';
