import type { EssLocation } from "@/lib/engineering/storage-types";

/** The places batteries may stand, in the words of the storage step and the review's storage summary. */
export const LOCATION_LABELS: Record<EssLocation, string> = {
  garage: "Garage or accessory structure",
  "outdoor-wall": "Outdoors or on an exterior wall",
  "utility-space": "Utility closet, basement or storage space",
  "habitable-space": "Habitable room",
  "sleeping-room": "Sleeping room or a closet opening into one",
  other: "Other",
};
