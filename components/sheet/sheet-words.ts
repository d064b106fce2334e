// Words the terminal sheet uses for where a resistor is fitted and what a core carries, on screen and printed.
export const FITTED_WORDS = { "at-detector": "at the detector", "at-panel-terminals": "at the panel terminals", "loop-back": "at the panel, on the loop-back cores" } as const;
export const CARRIES_WORDS = { loop: "loop", "loop-back": "loop-back", power: "power" } as const;
