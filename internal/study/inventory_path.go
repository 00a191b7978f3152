package study

// InventoryPath is where the study's inventory file was read from, ""
// when it has none.
func (s *Study) InventoryPath() string {
	if s.Inventory == nil {
		return ""
	}
	return s.Inventory.Path
}
