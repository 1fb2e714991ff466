// The demo's invented people: officials with one role each, and entrants. Names are made up.
export const demoDomain = "brackenmoor.test";

export const demoOfficials = [
  { key: "organizer", name: "Priya Raman", role: "organizer" },
  { key: "registrar", name: "Tom Okafor", role: "registrar" },
  { key: "chief", name: "Helen Marsh", role: "chief-scrutineer" },
  { key: "scrutineer", name: "Dev Patel", role: "scrutineer" },
  { key: "scrutineer2", name: "Sam Kowalski", role: "scrutineer" },
  { key: "clerk", name: "Gareth Lloyd", role: "clerk-of-course" },
] as const;

/** The two named demo entrants share one car (a driver and a co-driver). */
export const demoEntrants = [
  { key: "entrant", name: "Jo Whitfield" },
  { key: "codriver", name: "Alex Whitfield" },
] as const;

export const demoFirstNames = [
  "Aisha",
  "Ben",
  "Carys",
  "Daniel",
  "Elif",
  "Fergus",
  "Grace",
  "Hamza",
  "Isla",
  "Jamal",
  "Keira",
  "Liam",
  "Maya",
  "Niall",
  "Olu",
  "Pippa",
  "Rhys",
  "Sana",
  "Theo",
  "Uma",
  "Viktor",
  "Wren",
  "Yusuf",
  "Zara",
  "Callum",
  "Freya",
  "Idris",
  "Lena",
  "Marcus",
  "Nadia",
] as const;

export const demoLastNames = [
  "Ashdown",
  "Brennan",
  "Caldwell",
  "Dunmore",
  "Ellery",
  "Fairbairn",
  "Garside",
  "Holroyd",
  "Ingham",
  "Jessop",
  "Kettlewell",
  "Lockwood",
  "Mossop",
  "Northam",
  "Ormerod",
  "Pickles",
  "Quarmby",
  "Rishworth",
  "Sowerby",
  "Thackray",
  "Uttley",
  "Varley",
  "Wadsworth",
  "Yeadon",
] as const;

/** Common club track cars (real makes and models are facts, not another product's data). */
export const demoCars = [
  { make: "Mazda", model: "MX-5 NB", year: 2001 },
  { make: "Mazda", model: "MX-5 ND", year: 2017 },
  { make: "Honda", model: "Civic Type R EP3", year: 2004 },
  { make: "Honda", model: "S2000", year: 2006 },
  { make: "Toyota", model: "GR86", year: 2022 },
  { make: "Toyota", model: "MR2 Mk3", year: 2003 },
  { make: "BMW", model: "M3 E46", year: 2003 },
  { make: "BMW", model: "325i E36", year: 1995 },
  { make: "Subaru", model: "Impreza WRX STI", year: 2008 },
  { make: "Mitsubishi", model: "Lancer Evolution IX", year: 2006 },
  { make: "Nissan", model: "350Z", year: 2005 },
  { make: "Porsche", model: "Cayman S 987", year: 2007 },
  { make: "Lotus", model: "Elise S2", year: 2004 },
  { make: "Renault", model: "Clio 197", year: 2008 },
  { make: "Ford", model: "Fiesta ST", year: 2015 },
  { make: "Volkswagen", model: "Golf GTI Mk7", year: 2016 },
] as const;

export const demoColours = [
  "White",
  "Silver",
  "Black",
  "Red",
  "Blue",
  "Yellow",
  "Green",
  "Orange",
  "Grey",
] as const;
