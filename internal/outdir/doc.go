// Package outdir manages the output folder of a run: where it is, that it
// can be written before any work starts, that one run at a time writes it,
// and that a run's files replace the previous run's all at once.
//
// The rules, which the contributor guide repeats:
//
//   - --out is taken as given (relative to the working folder). [output]
//     dir is relative to the study file's folder and must stay inside it.
//     Without either the folder is out/<name> in the working folder, the
//     name being the study file's name made safe (Resolve).
//   - strutrisk replaces its output folder as a whole, so it writes only
//     into a folder that does not exist, is empty, or was written by
//     strutrisk: one that carries the marker file .strutrisk (listing the
//     files of the run) and nothing else, or, written before the marker
//     existed, holds only file names strutrisk writes. A folder with any
//     other file, the working folder and the folders holding it are
//     refused: strutrisk never deletes or moves a file it did not write.
//   - A run writes everything into a fresh hidden folder beside the target
//     (.NAME.tmp-*), writes the marker last, then swaps it in by two
//     renames and removes the old folder. A run killed while writing
//     leaves only the hidden folder, which the next run removes; one
//     killed between the two renames leaves a complete hidden folder,
//     which the next run puts in place before it starts.
//   - A lock file beside the target (.NAME.lock) keeps a second run from
//     writing the same folder at the same time: it is refused at once.
package outdir
