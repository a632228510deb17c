namespace Layers.Core.Batch;

/// <summary>One column of a batch summary table: its name (with its unit) and how a row fills it.</summary>
/// <param name="Name">The header, unit included.</param>
/// <param name="HoldsNumbers">True when its cells are numbers (written as they are); text cells are made spreadsheet-safe.</param>
/// <param name="Cell">The cell of a row; empty when the row has no value.</param>
public sealed record BatchColumn(string Name, bool HoldsNumbers, Func<BatchRow, string> Cell);
