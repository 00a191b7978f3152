package study

import "strings"

// withoutMissingMisspelt drops the "missing" problem of a key that another
// problem already explains as misspelt ("unknown key material.yeild; did
// you mean material.yield?"), so that one typo gives one message.
func withoutMissingMisspelt(probs []Problem) []Problem {
	const mean = "did you mean "
	meant := map[string]bool{}
	for _, pr := range probs {
		if i := strings.LastIndex(pr.Msg, mean); i >= 0 && strings.HasSuffix(pr.Msg, "?") {
			meant[pr.Msg[i+len(mean):len(pr.Msg)-1]] = true
		}
	}
	out := probs[:0:0]
	for _, pr := range probs {
		if meant[pr.Key] && strings.HasPrefix(pr.Msg, "missing") {
			continue
		}
		out = append(out, pr)
	}
	return out
}
