// Invented owners and vehicles of the demo. Makes and models are made-up names, the
// registrations are obviously demo plates, and the VINs are synthetic with a valid ISO 3779
// check digit (position 9) so the VIN validator accepts them.
import type { Drivetrain, FuelType } from "../kb/types";

export type DemoOwner = {
  key: string;
  workshop: "bramblegate" | "saltmarsh";
  name: string;
  email: string;
  phone: string;
};
export type DemoVehicle = {
  key: string;
  owner: string;
  vin: string;
  registration: string;
  make: string;
  model: string;
  year: number;
  engine: string;
  fuelType: FuelType;
  drivetrain: Drivetrain;
  mileageKm: number[]; // readings, oldest first
};

export const DEMO_OWNERS: DemoOwner[] = [
  {
    key: "harriet",
    workshop: "bramblegate",
    name: "Harriet Pennock",
    email: "harriet.pennock@mail.example",
    phone: "+44 7700 900101",
  },
  {
    key: "joel",
    workshop: "bramblegate",
    name: "Joel Amadi",
    email: "joel.amadi@mail.example",
    phone: "+44 7700 900102",
  },
  {
    key: "mirela",
    workshop: "bramblegate",
    name: "Mirela Stancu",
    email: "mirela.stancu@mail.example",
    phone: "+44 7700 900103",
  },
  {
    key: "fergus",
    workshop: "saltmarsh",
    name: "Fergus Dunleavy",
    email: "fergus.dunleavy@mail.example",
    phone: "+353 85 555 0104",
  },
];

export const DEMO_VEHICLES: DemoVehicle[] = [
  {
    key: "orlan-brisk",
    owner: "harriet",
    vin: "9RL0R1BR4N4100231",
    registration: "DEMO 101",
    make: "Orlan",
    model: "Brisk",
    year: 2019,
    engine: "1.4 petrol turbo",
    fuelType: "petrol",
    drivetrain: "fwd",
    mileageKm: [52_300, 68_940],
  },
  {
    key: "veskar-fathom",
    owner: "joel",
    vin: "9RLVS2FT4P7200417",
    registration: "DEMO 202",
    make: "Veskar",
    model: "Fathom",
    year: 2016,
    engine: "2.0 diesel",
    fuelType: "diesel",
    drivetrain: "awd",
    mileageKm: [121_800, 143_210],
  },
  {
    key: "pellin-tern",
    owner: "mirela",
    vin: "9RLPL3TN5L3300562",
    registration: "DEMO 303",
    make: "Pellin",
    model: "Tern",
    year: 2021,
    engine: "1.8 petrol hybrid",
    fuelType: "hybrid",
    drivetrain: "fwd",
    mileageKm: [31_050],
  },
  {
    key: "orlan-brisk-2",
    owner: "joel",
    vin: "9RL0R1BR9R4100988",
    registration: "DEMO 404",
    make: "Orlan",
    model: "Brisk Estate",
    year: 2014,
    engine: "1.6 petrol",
    fuelType: "petrol",
    drivetrain: "fwd",
    mileageKm: [160_400, 171_020],
  },
  {
    key: "veskar-fathom-ie",
    owner: "fergus",
    vin: "9RLVS2FT0S7201203",
    registration: "DEMO 505",
    make: "Veskar",
    model: "Fathom",
    year: 2018,
    engine: "2.0 diesel",
    fuelType: "diesel",
    drivetrain: "fwd",
    mileageKm: [98_700],
  },
];
