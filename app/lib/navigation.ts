import type { Role } from "./roles.ts";

export interface NavItem {
  label: string;
  path: string;
  /** Who sees it; an empty list means every signed-in person. */
  roles: Role[];
}

// Only what exists so far; later areas (Requirement sheets, Shortlists, Orders) join here.
export const NAV_ITEMS: NavItem[] = [
  { label: "Dashboard", path: "/", roles: [] },
  { label: "Catalogue", path: "/catalogue", roles: [] },
  { label: "Intakes", path: "/intakes", roles: ["librarian"] },
  { label: "People", path: "/people", roles: ["admin"] },
];

export interface NextStep {
  role: Role;
  title: string;
  text: string;
  link: { label: string; path: string } | null;
}

// What each role can do next, in the product's words; a step without a link is not built yet.
export const NEXT_STEPS: NextStep[] = [
  {
    role: "admin",
    title: "Invite your team",
    text: "Invite librarians, engineers and purchasers by e-mail, set their roles, and deactivate people who leave.",
    link: { label: "Open People", path: "/people" },
  },
  {
    role: "librarian",
    title: "Build the catalogue",
    text: "Import datasheet values and supplier offers from CSV intakes, check every flagged cell, commit, and roll back an intake that went wrong.",
    link: { label: "Start an intake", path: "/intakes/new" },
  },
  {
    role: "engineer",
    title: "Find the right transistor",
    text: "Browse the catalogue now; requirement sheets that score every part and Darlington or Sziklai pair at your circuit's operating point come next.",
    link: { label: "Browse the catalogue", path: "/catalogue" },
  },
  {
    role: "purchaser",
    title: "Turn shortlists into orders",
    text: "Price a submitted shortlist against offers, price breaks and stock, then pay through checkout and track the order.",
    link: null,
  },
];
