namespace Layers.Core.Results;

/// <summary>One solve of an error-controlled run.</summary>
/// <param name="Cells">Cells of its mesh.</param>
/// <param name="AcceptedSteps">Steps it took.</param>
/// <param name="RelativeTolerance">Its step tolerance.</param>
public sealed record SolveRecord(int Cells, int AcceptedSteps, double RelativeTolerance);
