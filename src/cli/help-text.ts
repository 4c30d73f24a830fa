/** The text of `chancewise --help`. */
export const HELP_TEXT = `chancewise: absolute risks, NNT and icon arrays for a treatment decision

Usage:
  chancewise compute --baseline RISK (--rr X | --or X | --hr X | --rrr PERCENT | --arr RISK)
                     [--ci LOW,HIGH] [--level 0.95] [--over YEARS --to YEARS] [--followup YEARS]
                     [--wanted] [--opposite] [--per 100|1000] [--json]
  chancewise compute --counts EVENTS/TOTAL,EVENTS/TOTAL [--level 0.95] [--method newcombe|wald]
                     [--wanted] [--opposite] [--per 100|1000] [--json]
  chancewise compute (TOPIC-FILE | --demo) [--per 100|1000] [--json]
  chancewise chart (TOPIC-FILE | --demo | effect flags of compute) --out FILE.svg
                     [--per 100|1000] [--outcome NAME] [--show-range]
  chancewise handout (TOPIC-FILE | --demo) --out FILE.pdf [--paper a4|letter] [--date YYYY-MM-DD]
                     [--show-nnt | --no-nnt] [--clinician TEXT] [--per 100|1000]
  chancewise handout TOPIC-FILE... --out-dir FOLDER [the other handout flags, for every file]

Risks: 0.2, 20%, 20/100, 1 in 5 or 200 per 1000. --rrr and its --ci are in percent.
--counts gives the option arm first, then the comparison arm.
--over is the period the baseline covers, --to the period wanted (constant hazard).
--wanted: the event is one people want (pain gone, stopped smoking); more of it is a benefit.
--opposite: the effect (or the counts) is for the opposite event, e.g. "still in pain" for
  "pain gone"; an odds ratio is inverted, other measures are applied to 1 − the risk.
handout: a topic file's own choices (paper, NNT, --per) are used unless a flag says otherwise.
--out-dir writes one PDF per topic file, named after it (-2, -3 when names repeat), and goes on
  past a bad file: each gets its line on stderr.
Exit status: 0 done, 2 input to fix (one line on stderr), 1 other failure (with --out-dir: a file
  that could not be written).
`;
