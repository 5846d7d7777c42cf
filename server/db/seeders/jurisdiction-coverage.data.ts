import type { Jurisdiction } from "@shared/compliance/jurisdiction";
import type { Agency } from "@shared/compliance/coverage";

/**
 * The seed coverage record of one jurisdiction: the offices to confirm with, where each name and
 * address was read, and what the library holds. No jurisdiction is seeded as reviewed: a review
 * is a person's statement that the library's rules for the jurisdiction are complete and current,
 * and nobody has made it yet. Administrators record their reviews (date and name) on the
 * coverage screen.
 */
export type CoverageSeed = {
  jurisdiction: Jurisdiction;
  wildlifeAgency: Agency;
  stateVeterinarian: Agency;
  /**
   * Where the names and addresses were checked. [published]: read in a stored copy of the office's
   * own page (or a page that links to it); [memory]: not checked in a stored copy, verify before
   * relying on it.
   */
  source: string;
  /** What the library holds for the jurisdiction, and what is known to be missing. */
  notes: string | null;
};

const MEMORY = "[memory] names and addresses not checked in a stored copy; verify on the office's own site";

const seed = (
  jurisdiction: Jurisdiction,
  wildlifeAgency: [string, string],
  stateVeterinarian: [string, string],
  source: string = MEMORY,
  notes: string | null = null,
): CoverageSeed => ({
  jurisdiction,
  wildlifeAgency: { name: wildlifeAgency[0], url: wildlifeAgency[1] },
  stateVeterinarian: { name: stateVeterinarian[0], url: stateVeterinarian[1] },
  source,
  notes,
});

const DEMO_NOTE = "The library holds invented demo rules for this state only: they never count as a review.";

/** Every jurisdiction of the library: federal, the 50 states, DC, Puerto Rico and the inhabited territories. */
export const COVERAGE_SEED: readonly CoverageSeed[] = [
  seed(
    "US",
    ["U.S. Fish and Wildlife Service", "https://www.fws.gov/"],
    ["USDA APHIS Veterinary Services", "https://www.aphis.usda.gov/"],
    "[published] APHIS address as printed in the Wyoming accredited veterinarian handbook (aphis.usda.gov/animal_health); [memory] fws.gov",
    "Encoded from published texts (SOURCES.md): 21 CFR 1240.62, 9 CFR 74.1, 50 CFR 14.81, the Lacey Act, 18 U.S.C. 42 and 50 CFR 16.15, 50 CFR 16.14, 9 CFR 1.1. Known gaps: the 16 salamander genera added in 2025 (90 FR 2170) are not encoded, 14 of the 20 genera of 2016 are from memory, and the endangered-species rule names a few commonly kept reptiles only (50 CFR 17.11 is not encoded in full).",
  ),
  seed(
    "AL",
    ["Alabama Department of Conservation and Natural Resources", "https://www.outdooralabama.com/"],
    ["Alabama Department of Agriculture and Industries, Animal Industries", "https://agi.alabama.gov/"],
  ),
  seed(
    "AK",
    ["Alaska Department of Fish and Game", "https://www.adfg.alaska.gov/"],
    ["Alaska Office of the State Veterinarian", "https://dec.alaska.gov/eh/vet/"],
  ),
  seed(
    "AZ",
    ["Arizona Game and Fish Department", "https://www.azgfd.com/"],
    ["Arizona Department of Agriculture, Animal Services", "https://agriculture.az.gov/"],
    MEMORY,
    DEMO_NOTE,
  ),
  seed(
    "AR",
    ["Arkansas Game and Fish Commission", "https://www.agfc.com/"],
    ["Arkansas Department of Agriculture, Livestock and Poultry", "https://www.agriculture.arkansas.gov/"],
  ),
  seed(
    "CA",
    ["California Department of Fish and Wildlife", "https://wildlife.ca.gov/"],
    [
      "California Department of Food and Agriculture, Animal Health Branch",
      "https://www.cdfa.ca.gov/ahfss/animal_health/",
    ],
    MEMORY,
    DEMO_NOTE,
  ),
  seed(
    "CO",
    ["Colorado Parks and Wildlife", "https://cpw.state.co.us/"],
    ["Colorado Department of Agriculture, State Veterinarian's Office", "https://ag.colorado.gov/"],
  ),
  seed(
    "CT",
    ["Connecticut Department of Energy and Environmental Protection, Wildlife Division", "https://portal.ct.gov/deep"],
    ["Connecticut Department of Agriculture, State Veterinarian", "https://portal.ct.gov/doag"],
    "[published] Conn. Gen. Stat. 22-26f: the State Veterinarian is an employee of the Department of Agriculture; [memory] addresses",
  ),
  seed(
    "DE",
    ["Delaware Division of Fish and Wildlife", "https://dnrec.delaware.gov/fish-wildlife/"],
    ["Delaware Department of Agriculture, Poultry and Animal Health", "https://agriculture.delaware.gov/"],
  ),
  seed(
    "FL",
    ["Florida Fish and Wildlife Conservation Commission", "https://myfwc.com/"],
    ["Florida Department of Agriculture and Consumer Services, Division of Animal Industry", "https://www.fdacs.gov/"],
    MEMORY,
    DEMO_NOTE,
  ),
  seed(
    "GA",
    ["Georgia Department of Natural Resources, Wildlife Resources Division", "https://georgiawildlife.com/"],
    ["Georgia Department of Agriculture, Animal Industry", "https://agr.georgia.gov/"],
    MEMORY,
    DEMO_NOTE,
  ),
  seed(
    "HI",
    ["Hawaii Department of Agriculture, Plant Quarantine Branch", "https://hdoa.hawaii.gov/pi/pq/"],
    ["Hawaii Department of Agriculture, Animal Industry Division", "https://hdoa.hawaii.gov/ai/"],
    "[published] HRS 141-3 and 150A-6 give animal import control to the department of agriculture; the Plant Quarantine Branch address as linked for the conditionally approved import list (hdoa.hawaii.gov/pi/pq); [memory] the Animal Industry address",
    "Published rules encoded: HRS 150A-6(3) (no live snake, no Gila monster). Hawaii's lists of prohibited, restricted and conditionally approved animals (HAR chapter 4-71) are not encoded, so the state is not reviewed. Wildlife on the islands is kept by the Department of Land and Natural Resources, Division of Forestry and Wildlife ([memory] https://dlnr.hawaii.gov/dofaw/).",
  ),
  seed(
    "ID",
    ["Idaho Department of Fish and Game", "https://idfg.idaho.gov/"],
    ["Idaho State Department of Agriculture, Division of Animal Industries", "https://agri.idaho.gov/"],
  ),
  seed(
    "IL",
    ["Illinois Department of Natural Resources", "https://dnr.illinois.gov/"],
    ["Illinois Department of Agriculture, Bureau of Animal Health and Welfare", "https://agr.illinois.gov/"],
  ),
  seed(
    "IN",
    [
      "Indiana Department of Natural Resources, Division of Fish and Wildlife",
      "https://www.in.gov/dnr/fish-and-wildlife/",
    ],
    ["Indiana State Board of Animal Health", "https://www.in.gov/boah/"],
  ),
  seed(
    "IA",
    ["Iowa Department of Natural Resources", "https://www.iowadnr.gov/"],
    ["Iowa Department of Agriculture and Land Stewardship, Animal Industry Bureau", "https://iowaagriculture.gov/"],
  ),
  seed(
    "KS",
    ["Kansas Department of Wildlife and Parks", "https://ksoutdoors.gov/"],
    ["Kansas Department of Agriculture, Division of Animal Health", "https://www.agriculture.ks.gov/"],
  ),
  seed(
    "KY",
    ["Kentucky Department of Fish and Wildlife Resources", "https://fw.ky.gov/"],
    ["Kentucky Department of Agriculture, Office of the State Veterinarian", "https://www.kyagr.com/statevet/"],
    "[published] fw.ky.gov: the department's own pages (About Us, Wildlife); [memory] the state veterinarian's address",
  ),
  seed(
    "LA",
    ["Louisiana Department of Wildlife and Fisheries", "https://www.wlf.louisiana.gov/"],
    ["Louisiana Department of Agriculture and Forestry, Animal Health", "https://www.ldaf.la.gov/"],
  ),
  seed(
    "ME",
    ["Maine Department of Inland Fisheries and Wildlife", "https://www.maine.gov/ifw/"],
    ["Maine Department of Agriculture, Conservation and Forestry, Animal Health", "https://www.maine.gov/dacf/"],
  ),
  seed(
    "MD",
    ["Maryland Department of Natural Resources, Wildlife and Heritage Service", "https://dnr.maryland.gov/wildlife/"],
    ["Maryland Department of Agriculture, Animal Health Program", "https://mda.maryland.gov/"],
  ),
  seed(
    "MA",
    [
      "Massachusetts Division of Fisheries and Wildlife",
      "https://www.mass.gov/orgs/division-of-fisheries-and-wildlife",
    ],
    [
      "Massachusetts Department of Agricultural Resources, Division of Animal Health",
      "https://www.mass.gov/orgs/division-of-animal-health",
    ],
  ),
  seed(
    "MI",
    ["Michigan Department of Natural Resources", "https://www.michigan.gov/dnr"],
    [
      "Michigan Department of Agriculture and Rural Development, Animal Industry Division",
      "https://www.michigan.gov/mdard",
    ],
    MEMORY,
    DEMO_NOTE,
  ),
  seed(
    "MN",
    ["Minnesota Department of Natural Resources", "https://www.dnr.state.mn.us/"],
    ["Minnesota Board of Animal Health", "https://www.bah.state.mn.us/"],
  ),
  seed(
    "MS",
    ["Mississippi Department of Wildlife, Fisheries, and Parks", "https://www.mdwfp.com/"],
    ["Mississippi Board of Animal Health", "https://www.mbah.ms.gov/"],
  ),
  seed(
    "MO",
    ["Missouri Department of Conservation", "https://mdc.mo.gov/"],
    ["Missouri Department of Agriculture, Animal Health Division", "https://agriculture.mo.gov/animals/"],
    "[published] mdc.mo.gov as listed in the Smithsonian's state permit directory (Birdnet, Missouri); [memory] the state veterinarian's address",
  ),
  seed(
    "MT",
    ["Montana Fish, Wildlife and Parks", "https://fwp.mt.gov/"],
    ["Montana Department of Livestock, Animal Health Bureau", "https://liv.mt.gov/"],
  ),
  seed(
    "NE",
    ["Nebraska Game and Parks Commission", "https://outdoornebraska.gov/"],
    ["Nebraska Department of Agriculture, Animal and Plant Health Protection", "https://nda.nebraska.gov/"],
  ),
  seed(
    "NV",
    ["Nevada Department of Wildlife", "https://www.ndow.org/"],
    ["Nevada Department of Agriculture, Animal Industry", "https://agri.nv.gov/"],
  ),
  seed(
    "NH",
    ["New Hampshire Fish and Game Department", "https://www.wildlife.nh.gov/"],
    [
      "New Hampshire Department of Agriculture, Markets and Food, Division of Animal Industry",
      "https://www.agriculture.nh.gov/",
    ],
  ),
  seed(
    "NJ",
    ["New Jersey Division of Fish and Wildlife", "https://dep.nj.gov/njfw/"],
    ["New Jersey Department of Agriculture, Division of Animal Health", "https://www.nj.gov/agriculture/divisions/ah/"],
  ),
  seed(
    "NM",
    ["New Mexico Department of Game and Fish", "https://www.wildlife.state.nm.us/"],
    ["New Mexico Livestock Board", "https://www.nmlbonline.com/"],
  ),
  seed(
    "NY",
    ["New York State Department of Environmental Conservation", "https://dec.ny.gov/"],
    [
      "New York State Department of Agriculture and Markets, Division of Animal Industry",
      "https://agriculture.ny.gov/",
    ],
    MEMORY,
    DEMO_NOTE,
  ),
  seed(
    "NC",
    ["North Carolina Wildlife Resources Commission", "https://www.ncwildlife.gov/"],
    ["North Carolina Department of Agriculture and Consumer Services, Veterinary Division", "https://www.ncagr.gov/"],
    MEMORY,
    DEMO_NOTE,
  ),
  seed(
    "ND",
    ["North Dakota Game and Fish Department", "https://gf.nd.gov/"],
    ["North Dakota Department of Agriculture, Animal Health", "https://www.ndda.nd.gov/"],
  ),
  seed(
    "OH",
    ["Ohio Department of Natural Resources, Division of Wildlife", "https://ohiodnr.gov/"],
    ["Ohio Department of Agriculture, Division of Animal Health", "https://agri.ohio.gov/"],
    MEMORY,
    `${DEMO_NOTE} Ohio Rev. Code 1533.31 (a shipment passing through by carrier is no import) is encoded as a transit setting [published].`,
  ),
  seed(
    "OK",
    ["Oklahoma Department of Wildlife Conservation", "https://www.wildlifedepartment.com/"],
    ["Oklahoma Department of Agriculture, Food and Forestry, Animal Industry Services", "https://ag.ok.gov/"],
  ),
  seed(
    "OR",
    ["Oregon Department of Fish and Wildlife", "https://myodfw.com/"],
    ["Oregon Department of Agriculture, Animal Health (State Veterinarian)", "https://www.oregon.gov/oda/"],
    "[published] myodfw.com: the department's own site (its accessibility statement names it); oregon.gov/oda: the department's import requirements pages, which refer to the Office of the State Veterinarian",
    "Oregon's nonnative wildlife rules (OAR 635-056: prohibited, controlled and noncontrolled species; an unlisted species may not be imported) and the import permit of ORS 596.341 are not encoded.",
  ),
  seed(
    "PA",
    ["Pennsylvania Fish and Boat Commission (reptiles and amphibians)", "https://www.fishandboat.com/"],
    ["Pennsylvania Department of Agriculture, Bureau of Animal Health", "https://www.agriculture.pa.gov/"],
    MEMORY,
    DEMO_NOTE,
  ),
  seed(
    "RI",
    ["Rhode Island Department of Environmental Management, Division of Fish and Wildlife", "https://dem.ri.gov/"],
    [
      "Rhode Island Department of Environmental Management, Division of Agriculture (State Veterinarian)",
      "https://dem.ri.gov/",
    ],
  ),
  seed(
    "SC",
    ["South Carolina Department of Natural Resources", "https://www.dnr.sc.gov/"],
    ["Clemson University Livestock Poultry Health (State Veterinarian)", "https://www.clemson.edu/public/lph/"],
  ),
  seed(
    "SD",
    ["South Dakota Game, Fish and Parks", "https://gfp.sd.gov/"],
    ["South Dakota Animal Industry Board", "https://aib.sd.gov/"],
  ),
  seed(
    "TN",
    ["Tennessee Wildlife Resources Agency", "https://www.tn.gov/twra.html"],
    [
      "Tennessee Department of Agriculture, Animal Health (State Veterinarian)",
      "https://www.tn.gov/agriculture/animals.html",
    ],
    "[published] the department of agriculture's Animal Health pages (tn.gov/agriculture/animals.html, import requirements referring to the State Veterinarian) and Tenn. Code 44-2-102; [memory] TWRA's current address (its older one was state.tn.us/twra)",
  ),
  seed(
    "TX",
    ["Texas Parks and Wildlife Department", "https://tpwd.texas.gov/"],
    ["Texas Animal Health Commission", "https://www.tahc.texas.gov/"],
    MEMORY,
    DEMO_NOTE,
  ),
  seed(
    "UT",
    ["Utah Division of Wildlife Resources", "https://wildlife.utah.gov/"],
    ["Utah Department of Agriculture and Food, Animal Industry", "https://ag.utah.gov/"],
  ),
  seed(
    "VT",
    ["Vermont Fish and Wildlife Department", "https://vtfishandwildlife.com/"],
    ["Vermont Agency of Agriculture, Food and Markets, Animal Health", "https://agriculture.vermont.gov/"],
  ),
  seed(
    "VA",
    ["Virginia Department of Wildlife Resources", "https://dwr.virginia.gov/"],
    [
      "Virginia Department of Agriculture and Consumer Services, Office of the State Veterinarian",
      "https://www.vdacs.virginia.gov/",
    ],
  ),
  seed(
    "WA",
    ["Washington Department of Fish and Wildlife", "https://wdfw.wa.gov/"],
    ["Washington State Department of Agriculture, Animal Health", "https://agr.wa.gov/"],
  ),
  seed(
    "WV",
    ["West Virginia Division of Natural Resources", "https://wvdnr.gov/"],
    ["West Virginia Department of Agriculture, Animal Health", "https://agriculture.wv.gov/"],
  ),
  seed(
    "WI",
    ["Wisconsin Department of Natural Resources", "https://dnr.wisconsin.gov/"],
    ["Wisconsin Department of Agriculture, Trade and Consumer Protection, Animal Health", "https://datcp.wi.gov/"],
  ),
  seed(
    "WY",
    ["Wyoming Game and Fish Department", "https://wgfd.wyo.gov/"],
    ["Wyoming Livestock Board", "https://wlsb.state.wy.us/"],
    "[published] wlsb.state.wy.us as printed in the Wyoming Livestock Board's accredited veterinarian handbook; [memory] Game and Fish's address",
  ),
  seed(
    "DC",
    ["District of Columbia Department of Energy and Environment, Fisheries and Wildlife", "https://doee.dc.gov/"],
    ["DC Health, Animal Services", "https://dchealth.dc.gov/"],
  ),
  seed(
    "PR",
    ["Puerto Rico Department of Natural and Environmental Resources", "https://www.drna.pr.gov/"],
    ["Puerto Rico Department of Agriculture, Veterinary Services", "https://www.agricultura.pr.gov/"],
  ),
  seed(
    "GU",
    ["Guam Department of Agriculture, Division of Aquatic and Wildlife Resources", "https://doag.guam.gov/"],
    ["Guam Department of Agriculture, Animal Health", "https://doag.guam.gov/"],
  ),
  seed(
    "VI",
    ["U.S. Virgin Islands Department of Planning and Natural Resources, Fish and Wildlife", "https://dpnr.vi.gov/"],
    ["U.S. Virgin Islands Department of Agriculture, Veterinary Services", "https://doa.vi.gov/"],
  ),
  seed(
    "AS",
    ["American Samoa Department of Marine and Wildlife Resources", "https://www.dmwr.as.gov/"],
    ["American Samoa Department of Agriculture", "https://www.americansamoa.gov/"],
  ),
  seed(
    "MP",
    ["Northern Mariana Islands Department of Lands and Natural Resources, Fish and Wildlife", "https://dlnr.gov.mp/"],
    ["Northern Mariana Islands Department of Lands and Natural Resources, Agriculture", "https://dlnr.gov.mp/"],
  ),
];
