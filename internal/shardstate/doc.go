// Package shardstate reads, writes and checks the state file a shard of a
// split run leaves in its output folder, and joins the states of every
// shard for the merge.
//
// The file, FileName, is gzip-compressed JSON (State). Format names it and
// FormatVersion (3) versions it; a reader refuses any other version. Each
// recorded sampling run (sim.ShardRun) holds, per block of the run that
// the shard evaluated, the sample and failure counts and, per output and
// for g, the count, NaN count, the moment sums, extremes and the sparse
// fine histogram; floating-point values are written as their IEEE 754 bit
// patterns so that they read back exactly. Notes hold, by key, what the
// shard computed above sampling (sim.Shard.Note): the study's FORM result,
// the inventory members it owns, its blocks of an inventory's joint
// sample (version 2; version 1 had none). Version 3 adds the hash of the
// study's inventory file, as a shard runs members of it. Writing the same state twice
// gives the same bytes.
package shardstate
