// The newsroom's held-out evaluation set: questions and answers about invented
// Nadipur news, written by hand and kept out of the training shards. One item is
// leaked into an incoming shard on purpose (LEAKED_EVAL_ID, see generate.mjs).

export const EVAL_ITEMS = [
  { id: 'qa-en-01', text: 'Question: How many new reading desks did the Nadipur city library add to its upstairs hall last winter? Answer: Forty-eight desks, paid for by a collection among retired teachers.' },
  { id: 'qa-en-02', text: 'Question: Which team won the district league final that was held up by rain at the river ground? Answer: Pulpar Sporting Club, by three wickets with two balls to spare.' },
  { id: 'qa-en-03', text: 'Question: What did the corporation promise the people of Ghatiya after the pipeline burst near the temple steps? Answer: Water tankers twice a day until the repair was finished.' },
  { id: 'qa-en-04', text: 'Question: Why did the Sarjani fair open a day late this year? Answer: The river was still above the warning mark, so officials waited one more day for the water to fall before letting stalls go up.' },
  { id: 'qa-en-05', text: 'Question: What price did onions reach in the Nadipur retail market during the week of heavy rain? Answer: Seventy rupees a kilo, almost twice the usual price.' },
  { id: 'qa-en-06', text: 'Question: Which village health camp found the largest number of cataract patients? Answer: Amlipur, where doctors listed sixty-two people for surgery.' },
  { id: 'qa-en-07', text: 'Question: Who topped the intermediate examination in Nadipur district? Answer: A student of the girls’ college in Imlitola, with ninety-eight per cent.' },
  { id: 'qa-en-08', text: 'Question: What change did the transport office make to the Station Road bus route? Answer: Buses now stop at the new hospital gate and come every twenty minutes.' },
  { id: 'qa-en-09', text: 'Question: How far above the danger mark did the Sarjani rise at its peak? Answer: One point four metres, the highest level on record in eleven years.' },
  { id: 'qa-en-10', text: 'Question: What did the council decide about stray cattle on the bypass? Answer: A separate team with two trucks will take the animals to a shelter outside the city.' },
  { id: 'qa-hi-01', text: 'प्रश्न: नदीपुर नगर निगम ने पुलपार में नया जल शोधन संयंत्र कब तक चालू करने का वादा किया? उत्तर: अगले वर्ष जून तक, ताकि गर्मियों में पानी की किल्लत न हो।' },
  { id: 'qa-hi-02', text: 'प्रश्न: ज़िला लीग के फ़ाइनल में प्लेयर ऑफ़ द मैच किसे चुना गया? उत्तर: बांसघाट इलेवन के बाएं हाथ के स्पिनर को, जिन्होंने चार विकेट लिए और नाबाद तीस रन बनाए।' },
  { id: 'qa-hi-03', text: 'प्रश्न: सरजनी मेले में इस बार कुल कितनी दुकानें लगाई गईं? उत्तर: लगभग तीन सौ बीस, जो पिछली बार से पचास अधिक हैं।' },
  { id: 'qa-hi-04', text: 'प्रश्न: अमलीपुर के स्वास्थ्य शिविर में कितने बच्चों का टीकाकरण हुआ? उत्तर: दो सौ चालीस, जिनमें ज़्यादातर पांच साल से छोटे थे।' },
  { id: 'qa-hi-05', text: 'प्रश्न: नगर पुस्तकालय अब रविवार को कितने बजे तक खुलता है? उत्तर: शाम छह बजे तक, जबकि बाकी दिनों में रात नौ बजे तक।' },
  { id: 'qa-hi-06', text: 'प्रश्न: भारी बारिश के बाद किन दो गांवों तक नावों से राशन पहुंचाना पड़ा? उत्तर: खजूरी कलां और सोनपरी तक, क्योंकि वहां की सड़क पानी में डूबी थी।' },
  { id: 'qa-hi-07', text: 'प्रश्न: इस सीज़न में मंडी में गेहूं का सबसे ऊंचा भाव क्या रहा? उत्तर: दो हज़ार सात सौ रुपये प्रति क्विंटल, जो समर्थन मूल्य से थोड़ा ऊपर था।' },
  { id: 'qa-hi-08', text: 'प्रश्न: इमलीटोला से स्टेशन तक की नई बस का किराया कितना तय हुआ? उत्तर: दस रुपये, और विद्यार्थियों के लिए उसका आधा।' },
  { id: 'qa-hi-09', text: 'प्रश्न: हाईस्कूल में ज़िले का उत्तीर्ण प्रतिशत पिछले साल के मुकाबले कितना बढ़ा? उत्तर: करीब चार अंक, और लड़कियां इस बार भी लड़कों से आगे रहीं।' },
  { id: 'qa-hi-10', text: 'प्रश्न: बाईपास सड़क का काम किस महीने तक पूरा होना है? उत्तर: अक्टूबर तक, हालांकि बारिश के कारण देरी की आशंका है।' },
];

// The item copied word for word into a document of data/incoming/english-03.
export const LEAKED_EVAL_ID = 'qa-en-04';
