// Words shown for record states; kept beside each other so every screen says the same thing.
export const ITEM_STATE_LABELS: Record<string, string> = {
  RECEIVED: "Received", STORED: "Stored", CUT: "Cut", PREPARED: "Prepared", ASSIGNED: "In a cell",
  UNDER_TEST: "Under test", TESTED: "Tested", RETAINED: "Retained", DISPOSED: "Disposed",
};

export const RUN_STATE_LABELS: Record<string, string> = {
  SET_UP: "Set up", SATURATING: "Saturating", EQUILIBRATING: "Equilibrating", PERMEATING: "Permeating",
  TERMINATED: "Terminated", POST_TEST_RECORDED: "Post-test recorded", SUBMITTED: "Awaiting review",
  RETURNED: "Returned for changes", APPROVED: "Approved", ABANDONED: "Abandoned",
};

export const EQUIPMENT_KIND_LABELS: Record<string, string> = {
  PERMEAMETER_CELL: "Permeameter cell", BURETTE_PANEL: "Burette panel", PRESSURE_TRANSDUCER: "Pressure transducer", THERMOMETER: "Thermometer",
  THICKNESS_GAUGE: "Thickness gauge", TIMER: "Timer or logger clock",
  BALANCE: "Balance", OVEN: "Drying oven", GRADUATED_CYLINDER: "Graduated cylinder", FILTER_PRESS: "Filter press",
  TENSILE_FRAME: "Tensile frame", LOAD_CELL: "Load cell",
};
