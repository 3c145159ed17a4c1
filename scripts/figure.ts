/**
 * Command line: draw a scenario's Diagram or a sweep's chart as the app exports it, and write the file to
 * standard output.
 *   npm run --silent figure -- FILE.json [--what diagram|sweep] [--format svg|pdf|png] [--theme light|dark]
 *     [--width PX] [--ratio 1|2|4] [--caption|--no-caption] [--legend|--no-legend] [--ground solid|transparent]
 *     [--lettering embedded|outlines] [--vary recombination-time|hold-time|lab-distance|gas-pressure|surroundings-temperature|surface-distance] [--from Q] [--to Q]
 *     [--points N] > out.svg
 * Bad input prints the reasons on standard error, one "path: message" a line, and exits with code 2.
 */
import { figureCommand } from "./figure-command";
import { runCommand } from "./scenario-input";

void runCommand(() => figureCommand(process.argv.slice(2)));
