// Demo accounts of the invented scenario. Demo credentials, not secrets:
// they exist only in a local demo database.
export const DEMO_SIGN_INS = {
  password: "ohmstead-demo",
  users: [
    { role: "admin", email: "marta@quillmoor.example", name: "Marta Quillen", org: "main" },
    { role: "coordinator", email: "dana@quillmoor.example", name: "Dana Okafor", org: "main" },
    { role: "coordinator", email: "priya@quillmoor.example", name: "Priya Ventresca", org: "main" },
    { role: "installer", email: "luis@quillmoor.example", name: "Luis Arkwright", org: "main" },
    { role: "installer", email: "tomasz@quillmoor.example", name: "Tomasz Belden", org: "main" },
    { role: "admin", email: "rhea@harrowgate.example", name: "Rhea Castellan", org: "other" },
    { role: "coordinator", email: "owen@harrowgate.example", name: "Owen Pellham", org: "other" },
  ],
};
