// Placeholder until the CLI lands.
console.log('sluice');
