/**
 * An invented truck's door placard, scale ticket and body points as a person types them in inch
 * units, by the label of each field (the garage vehicle page and the shop counter label them
 * alike, from lib/garage/loadProfile.ts): P265/70R17 113S at 35 psi front and rear, 3,086 lb
 * front and 2,646 lb rear, body points measured on its 265/70R17 tires.
 */
export const PLACARD_TYPED_IN_INCHES: Readonly<Record<string, string>> = {
  "Tire size on the placard": "P265/70R17 113S",
  "Placard cold pressure, front (psi)": "35",
  "Placard cold pressure, rear (psi)": "35",
  "Front axle weight, scale ticket (lb)": "3086",
  "Rear axle weight, scale ticket (lb)": "2646",
  "Front corner height (in)": "24",
  "Front corner ahead of the front axle (in)": "35",
  "Rear corner height (in)": "26",
  "Rear corner behind the rear axle (in)": "40",
  "Lowest point midway, height (in)": "11",
  "Wheelbase (in)": "118",
};
