package report

import (
	"bytes"
	"encoding/json"
	"fmt"
)

// EncodeJSON is the one JSON encoder of strutrisk's documents: indented
// by two spaces, "<", ">" and "&" written as they are (not escaped for
// HTML, as a text a reader greps), ending in a newline.
func EncodeJSON(v any) ([]byte, error) {
	var buf bytes.Buffer
	enc := json.NewEncoder(&buf)
	enc.SetIndent("", "  ")
	enc.SetEscapeHTML(false)
	if err := enc.Encode(v); err != nil {
		return nil, err
	}
	return buf.Bytes(), nil
}

// DocumentJSON encodes d as results.json holds it and `run --json` and
// `check --json` print it: EncodeJSON with "warnings" always an array.
func DocumentJSON(d *Document) ([]byte, error) {
	c := *d
	if c.Warnings == nil {
		c.Warnings = []string{}
	}
	out, err := EncodeJSON(&c)
	if err != nil {
		return nil, fmt.Errorf("report: cannot encode the result document (a value is probably NaN or infinite): %w", err)
	}
	return out, nil
}
