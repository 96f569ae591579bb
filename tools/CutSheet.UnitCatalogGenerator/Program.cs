using CutSheet.UnitCatalogGenerator;

// Usage: dotnet run --project tools/CutSheet.UnitCatalogGenerator [--check]
//   (no argument) write src/CutSheet.Language/Units/Generated/UnitsNetTable.g.cs
//   --check       compare with the committed file; exit 1 if it is stale (for CI)
bool check = args.Contains("--check");
if (args.Any(a => a != "--check"))
{
    Console.Error.WriteLine("usage: CutSheet.UnitCatalogGenerator [--check]");
    return 2;
}

string? root = RepoRoot.Find(Directory.GetCurrentDirectory());
if (root is null)
{
    Console.Error.WriteLine("CutSheet.sln not found in the current directory or any parent.");
    return 2;
}

var result = UnitTableGenerator.Generate();
Console.Error.WriteLine($"UnitsNet {UnitTableGenerator.UnitsNetVersion()}: {result.Rows} rows; " +
    $"{result.SkippedUnits.Count} units skipped (conversion threw or is not affine): {string.Join(", ", result.SkippedUnits)}; " +
    $"{SiPolicy.Excluded.Count} quantities excluded by SiPolicy.");

string path = Path.Combine(root, UnitTableGenerator.OutputPath);
if (check)
{
    string? onDisk = File.Exists(path) ? RepoRoot.ReadNormalized(path) : null;
    if (onDisk == result.Text) return 0;
    Console.Error.WriteLine($"{UnitTableGenerator.OutputPath} is stale: run 'dotnet run --project tools/CutSheet.UnitCatalogGenerator' and commit it.");
    return 1;
}

Directory.CreateDirectory(Path.GetDirectoryName(path)!);
File.WriteAllText(path, result.Text);   // UTF-8 without BOM, "\n" line endings
Console.Error.WriteLine($"wrote {UnitTableGenerator.OutputPath}");
return 0;
