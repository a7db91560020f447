// ISO 639-3 macrolanguages and their individual member languages.
//
// Follows the ISO 639-3 macrolanguage mappings published by SIL International,
// the ISO 639-3 registration authority. Written from memory, not generated:
// the `iso-639-3` package carries each code's scope but not the mappings. Every
// code here is checked against that package by test/policy/data.test.ts (each
// key is a macrolanguage, each member an individual language), which catches
// typos and retired codes but not a member filed under the wrong macrolanguage.
//
// For each macrolanguage the members that franc 6.2 can output are included
// (e.g. `arb` for Arabic, `cmn` for Chinese, `pes`/`prs` for Persian, `zlm`/`ind`
// for Malay), because `covers` exists so that a detector's label for a member
// counts under a policy key written as the macrolanguage.

/** Macrolanguage ISO 639-3 code → its individual member languages' codes. */
export const MACROLANGUAGE_MEMBERS: Readonly<Record<string, readonly string[]>> = {
  aka: ['fat', 'twi'],
  ara: [
    'aao', 'abh', 'abv', 'acm', 'acq', 'acw', 'acx', 'acy', 'adf', 'aeb', 'aec', 'afb', 'ajp', 'apc', 'apd',
    'arb', 'arq', 'ars', 'ary', 'arz', 'auz', 'avl', 'ayh', 'ayl', 'ayn', 'ayp', 'pga', 'shu', 'ssh',
  ],
  aym: ['ayc', 'ayr'],
  aze: ['azb', 'azj'],
  bal: ['bcc', 'bgn', 'bgp'],
  bik: ['bcl', 'bln', 'bto', 'cts', 'fbl', 'lbl', 'rbl', 'ubl'],
  bnc: ['ebk', 'lbk', 'obk', 'rbk', 'vbk'],
  bua: ['bxm', 'bxr', 'bxu'],
  chm: ['mhr', 'mrj'],
  cre: ['crj', 'crk', 'crl', 'crm', 'csw', 'cwd'],
  del: ['umu', 'unm'],
  den: ['scs', 'xsl'],
  din: ['dib', 'dik', 'dip', 'diw', 'dks'],
  doi: ['dgo', 'xnr'],
  est: ['ekk', 'vro'],
  fas: ['pes', 'prs'],
  ful: ['ffm', 'fub', 'fuc', 'fue', 'fuf', 'fuh', 'fui', 'fuq', 'fuv'],
  gba: ['bdt', 'gbp', 'gbq', 'gmm', 'gso', 'gya'],
  gon: ['esg', 'gno', 'wsg'],
  grb: ['gbo', 'gec', 'grj', 'grv', 'gry'],
  grn: ['gnw', 'gug', 'gui', 'gun', 'nhd'],
  hai: ['hax', 'hdn'],
  hbs: ['bos', 'cnr', 'hrv', 'srp'],
  hmn: [
    'cqd', 'hea', 'hma', 'hmc', 'hmd', 'hme', 'hmg', 'hmh', 'hmi', 'hmj', 'hml', 'hmm', 'hmp', 'hmq',
    'hms', 'hmw', 'hmy', 'hmz', 'hnj', 'hrm', 'huj', 'mmr', 'muq', 'mww', 'sfm',
  ],
  iku: ['ike', 'ikt'],
  ipk: ['esi', 'esk'],
  jrb: ['ajt', 'aju', 'jye', 'yhd', 'yud'],
  kau: ['kby', 'knc', 'krt'],
  kln: ['enb', 'eyo', 'niq', 'oki', 'pko', 'sgc', 'spy', 'tec', 'tuy'],
  kok: ['gom', 'knn'],
  kom: ['koi', 'kpv'],
  kon: ['kng', 'kwy', 'ldi'],
  kpe: ['gkp', 'xpe'],
  kur: ['ckb', 'kmr', 'sdh'],
  lah: ['hnd', 'hno', 'jat', 'phr', 'pnb', 'skr', 'xhe'],
  lav: ['ltg', 'lvs'],
  luy: ['bxk', 'ida', 'lkb', 'lko', 'lks', 'lri', 'lrm', 'lsm', 'lto', 'lts', 'lwg', 'nle', 'nyd', 'rag'],
  man: ['emk', 'mku', 'mlq', 'mnk', 'msc', 'mwk'],
  mlg: ['bhr', 'bmm', 'bzc', 'msh', 'plt', 'skg', 'tdx', 'tkg', 'txy', 'xmv', 'xmw'],
  mon: ['khk', 'mvf'],
  msa: [
    'bjn', 'btj', 'bve', 'bvu', 'coa', 'dup', 'hji', 'ind', 'jak', 'jax', 'kvb', 'kvr', 'kxd', 'lce', 'lcf',
    'liw', 'max', 'meo', 'mfa', 'mfb', 'min', 'mqg', 'msi', 'mui', 'orn', 'ors', 'pel', 'pse', 'tmw', 'urk',
    'vkk', 'vkt', 'xmm', 'zlm', 'zmi', 'zsm',
  ],
  mwr: ['dhd', 'mtr', 'mve', 'rwr', 'swv', 'wry'],
  nep: ['dty', 'npi'],
  nor: ['nno', 'nob'],
  oji: ['ciw', 'ojb', 'ojc', 'ojg', 'ojs', 'ojw', 'otw'],
  ori: ['ory', 'spv'],
  orm: ['gax', 'gaz', 'hae', 'orc'],
  pus: ['pbt', 'pbu', 'pst'],
  que: [
    'qub', 'qud', 'quf', 'qug', 'quh', 'quk', 'qul', 'qup', 'qur', 'qus', 'quw', 'qux', 'quy', 'quz', 'qva',
    'qvc', 'qve', 'qvh', 'qvi', 'qvj', 'qvl', 'qvm', 'qvn', 'qvo', 'qvp', 'qvs', 'qvw', 'qvz', 'qwa', 'qwc',
    'qwh', 'qws', 'qxa', 'qxc', 'qxh', 'qxl', 'qxn', 'qxo', 'qxp', 'qxr', 'qxt', 'qxu', 'qxw',
  ],
  raj: ['bgq', 'gda', 'gju', 'hoj', 'mup', 'wbr'],
  rom: ['rmc', 'rmf', 'rml', 'rmn', 'rmo', 'rmw', 'rmy'],
  sqi: ['aae', 'aat', 'aln', 'als'],
  srd: ['sdc', 'sdn', 'src', 'sro'],
  swa: ['swc', 'swh'],
  syr: ['aii', 'cld'],
  tmh: ['taq', 'thv', 'thz', 'ttq'],
  uzb: ['uzn', 'uzs'],
  yid: ['ydd', 'yih'],
  zap: [
    'zaa', 'zab', 'zac', 'zad', 'zae', 'zaf', 'zai', 'zam', 'zao', 'zaq', 'zar', 'zas', 'zat', 'zav', 'zaw',
    'zax', 'zca', 'zoo', 'zpa', 'zpb', 'zpc', 'zpd', 'zpe', 'zpf', 'zpg', 'zph', 'zpi', 'zpj', 'zpk', 'zpl',
    'zpm', 'zpn', 'zpo', 'zpp', 'zpq', 'zpr', 'zps', 'zpt', 'zpu', 'zpv', 'zpw', 'zpx', 'zpy', 'zpz', 'zsr',
    'zte', 'ztg', 'ztl', 'ztm', 'ztn', 'ztp', 'ztq', 'zts', 'ztt', 'ztu', 'ztx', 'zty',
  ],
  zha: [
    'zch', 'zeh', 'zgb', 'zgm', 'zgn', 'zhd', 'zhn', 'zlj', 'zln', 'zlq', 'zqe', 'zyb', 'zyg',
    'zyj', 'zyn', 'zzj',
  ],
  zho: [
    'cdo', 'cjy', 'cmn', 'cnp', 'cpx', 'csp', 'czh', 'czo', 'gan', 'hak', 'hsn', 'lzh', 'mnp', 'nan', 'wuu',
    'yue',
  ],
  zza: ['diq', 'kiu'],
};
