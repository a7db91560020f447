// Hindi news sentences written in Latin letters, as a transliterating feed or a
// phone keyboard produces them. The incoming shard built from these declares
// lang "hi", so a gate that expects Hindi in Devanagari must notice. Names and
// places come from names.mjs (Latin spelling). Slots as in hindi.mjs.

export const WEEKDAYS = ['somvar', 'mangalvar', 'budhvar', 'guruvar', 'shukravar', 'shanivar', 'ravivar'];
export const CROPS = ['gehun', 'dhaan', 'chana', 'bajra', 'makka', 'soybean', 'jau'];

export const SENTENCES = [
  '{city} nagar nigam ne {weekday} ko naye bajat ko manzoori di.',
  '{ward} ward ke parshad {person} ne baithak mein peene ke paani ki kami ka mudda uthaya.',
  'Mausam vibhag ne agle {n:2-5} dinon tak [halki baarish|ghane kohre|tez hawaon] ki sambhavna jatai hai.',
  '{weekday} ko din bhar tez dhoop rahi aur adhiktam tapmaan {n:36-44} degree darj kiya gaya.',
  'Mandi mein {crop} ka bhav {n:1800-6500:10} rupaye prati quintal tak pahunch gaya.',
  'Kisan {person} ne kaha ki is baar laagat badhne se munafa kam reh gaya hai.',
  'Zila khel maidan par {team} ne {team2} ko {n:2-9} wicket se haraya.',
  'Salami ballebaaz {person} ne {n:40-120} gendon mein {n:50-130} ranon ki shandaar pari kheli.',
  '{river} nadi ka jalstar khatre ke nishan se {f:0.2-1.8} meter upar pahunch gaya hai.',
  'Prashasan ne tatbandh ke paas rehne wale {n:40-300} parivaron ko surakshit sthanon par pahunchaya.',
  '{ward} mein nai sadak ka kaam {weekday} se shuru ho gaya.',
  '{ward} se {ward2} jaane wali sadak par jagah jagah gaddhe hone se rahgir pareshan hain.',
  '{village} mein lage netra shivir mein {n:150-600} logon ki aankhon ki jaanch ki gayi.',
  'Doctor {person} ne logon ko machharon se bachne ke liye ghar ke aas paas paani jama na hone dene ki salah di.',
  '{river} ke kinare lagne wala mela {weekday} se shuru ho gaya aur {n:5-12} din tak chalega.',
  'Mele ki suraksha ke liye {n:100-400:10} pulisakarmi tainaat kiye gaye hain.',
  'Nagar pustakalay mein {weekday} ko naye vachnalay ka udghatan kiya gaya.',
  'Pustakalay ab subah {n:7-9} baje se raat {n:8-10} baje tak khula rahega.',
  'Nagar bas sewa ne {ward} aur {ward2} ke beech nai bus shuru ki hai.',
  'Bus har {n:15-40:5} minute par chalegi aur nyuntam kiraya {n:5-15} rupaye rakha gaya hai.',
  'Pariksha parinaam aate hi {ward} ke schoolon mein jashn ka mahaul ban gaya.',
  '{girl} ne intermediate pariksha mein {f:93-99} pratishat ank hasil kar zile mein pehla sthan prapt kiya.',
  'Sthaniya logon ne is pehal ka swagat kiya hai.',
  'Adhikariyon ne kaha ki kisi bhi shikayat ke liye log seedhe karyalay aa sakte hain.',
  'Jalbharav ke kaaran {ward2} ki mukhya sadak par {n:3-8} ghante tak yatayat thap raha.',
  'Auto chalakon ne kiraya badhane ki maang ko lekar {weekday} ko pradarshan kiya.',
  'Dukandaar {person} ne ummeed jatai ki agle {n:10-20} dinon mein daam sthir ho jayenge.',
  'Shaam hote hi poora ghat roshni se jagmaga utha.',
  'Baithak mein bataya gaya ki pichhle saal sampatti kar se {n:20-90} crore rupaye ki vasooli hui thi.',
  '{veg} {n:20-80} rupaye kilo bika, jabki pichhle mahine yahi {n:10-30} rupaye kilo tha.',
  'Tez gendbaaz {person} ne {n:3-6} wicket lekar virodhi team ki kamar tod di.',
  'Rahat shiviron mein bhojan, peene ke paani aur davaon ki vyavastha ki gayi hai.',
  'Shivir mein blood pressure, sugar aur hemoglobin ki jaanch muft ki gayi.',
  'Thekedar {person} ne bataya ki baarish se pehle damar bichhane ka kaam poora kar liya jayega.',
  'Kohre ke kaaran {city} station par {n:3-9} trainein {n:1-6} ghante der se pahunchin.',
  'Mithai ki dukanon par der raat tak grahakon ki bheed lagi rahi.',
  'Nigam ayukt {person} ne aashvasan diya ki mahine ke ant tak sabhi shikayaton ka niptara kar diya jayega.',
  '{village} ke {n:20-60} vidyarthi pratham shreni mein uttirn hue.',
  'Pichhle {n:24-72:12} ghanton mein zile mein kul {f:2-40} millimeter baarish darj ki gayi.',
  'Parivahan vibhag ne bina permit chal rahe {n:10-60} vahanon ka chalan kiya.',
];

export const VEGETABLES = ['Tamatar', 'Pyaaz', 'Aloo', 'Baingan', 'Kaddu', 'Karela', 'Lahsun'];
export const TEAM_SUFFIXES = ['Cricket Club', 'XI', 'Youth Club', 'Rangers'];
