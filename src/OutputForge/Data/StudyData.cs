using OutputForge.Spec;
using OutputForge.Common;

namespace OutputForge.Data;

/// <summary>The datasets of one study, read from a data folder and checked against the ADaM conventions.</summary>
public sealed class StudyData
{
    private readonly Dictionary<string, Dataset> _datasets;

    private StudyData(string folder, Dictionary<string, Dataset> datasets, IReadOnlyCollection<string>? unread = null)
    {
        Folder = folder;
        _datasets = datasets;
        Unread = unread ?? [];
        _subjectLevelRowOfSubject = new Lazy<Dictionary<string, int>>(() =>
        {
            var adsl = SubjectLevel;
            var subjects = adsl.Get(AdamConformance.SubjectVariable);
            var rowOfSubject = new Dictionary<string, int>(adsl.RowCount, StringComparer.Ordinal);
            for (var row = 0; row < adsl.RowCount; row++)
            {
                rowOfSubject[subjects.GetText(row)!] = row;
            }
            return rowOfSubject;
        }, LazyThreadSafetyMode.ExecutionAndPublication);
    }

    public string Folder { get; }

    private readonly Lazy<Dictionary<string, int>> _subjectLevelRowOfSubject;
    private readonly System.Collections.Concurrent.ConcurrentDictionary<string, Lazy<SubjectLevelRows>> _subjectLevelRows = new(StringComparer.Ordinal);

    /// <summary>
    /// The ADSL rows of the records of <paramref name="records"/>: shared by all tables when it is one of this study's
    /// datasets, made anew for any other (such as records a table derived).
    /// </summary>
    public SubjectLevelRows SubjectLevelRowsOf(Dataset records) =>
        _datasets.TryGetValue(records.Name, out var own) && ReferenceEquals(own, records)
            ? _subjectLevelRows.GetOrAdd(records.Name, _ => new Lazy<SubjectLevelRows>(
                () => records.Find(AdamConformance.SubjectVariable) is { } subjects
                    ? new SubjectLevelRows(_subjectLevelRowOfSubject.Value, subjects)
                    : new SubjectLevelRows(_subjectLevelRowOfSubject.Value, records.RowCount),
                LazyThreadSafetyMode.ExecutionAndPublication)).Value
            : new SubjectLevelRows(_subjectLevelRowOfSubject.Value, records.RowCount);

    public Dataset SubjectLevel => _datasets["adsl"];

    public IReadOnlyCollection<Dataset> Datasets => _datasets.Values;

    /// <summary>
    /// The dataset; a dataset of the study the run left unread (<see cref="ColumnProjection"/>) is an error, never an
    /// empty dataset: an analysis using it was not declared to.
    /// </summary>
    public Dataset this[string name] => _datasets.TryGetValue(name, out var dataset) ? dataset
        : Unread.Contains(name) ? throw new DataException(Folder, null, null,
            $"dataset '{name}' was not read: the run reads only the datasets its tables declare, and this one was not declared (an error in OutputForge; please report it)")
        : throw new KeyNotFoundException($"no dataset '{name}'");

    /// <summary>The datasets of the study spec that the run did not read, because none of its tables uses them.</summary>
    public IReadOnlyCollection<string> Unread { get; }

    /// <summary>
    /// Study data made of datasets built in memory (e.g. the stand-in records mock shells are laid
    /// out from), held to the same ADaM checks as data read from files.
    /// </summary>
    public static StudyData FromDatasets(string folder, IEnumerable<Dataset> datasets)
    {
        var byName = datasets.ToDictionary(d => d.Name, StringComparer.Ordinal);
        AdamConformance.CheckSubjectLevel(byName["adsl"]);
        foreach (var dataset in byName.Values.Where(d => d.Name != "adsl"))
        {
            AdamConformance.CheckAgainstSubjectLevel(dataset, byName["adsl"]);
        }
        return new StudyData(folder, byName);
    }

    /// <summary>Reads every dataset the study spec lists from <paramref name="folder"/>.</summary>
    public static StudyData Load(StudySpec study, string folder) => Load(study, folder, DataReadOptions.Default, _ => { });

    /// <summary>Reads with <paramref name="options"/>, passing warnings about the data to <paramref name="warn"/>.</summary>
    public static StudyData Load(StudySpec study, string folder, DataReadOptions options, Action<string> warn)
    {
        if (!Directory.Exists(folder))
        {
            throw new DataException(folder, null, null, "no such data folder");
        }
        var files = study.Data.Datasets
            .Where(d => d.Key == "adsl" || options.Projection is null || options.Projection.ReadsDataset(d.Key))
            .OrderBy(d => d.Key == "adsl" ? 0 : 1).ThenBy(d => d.Key, StringComparer.Ordinal).ToList();
        var unread = study.Data.Datasets.Keys.Where(k => files.All(f => f.Key != k)).OrderBy(k => k, StringComparer.Ordinal).ToList();
        // The files are read on all cores, a large BDS file in parts (CsvFileParts), the largest parts first, so that
        // no core waits for one file; each file keeps its warnings and error, replayed below in the listed order, so
        // messages do not depend on thread timing.
        var outcomes = new (Dataset? Dataset, List<string> Warnings, Exception? Error)[files.Count];
        var opened = new CsvFileParts?[files.Count];
        Parallel.For(0, files.Count, new ParallelOptions { MaxDegreeOfParallelism = Environment.ProcessorCount }, i =>
        {
            var (name, fileName) = files[i];
            try
            {
                var path = Path.Combine(folder, fileName);
                if (!File.Exists(path))
                {
                    throw new DataException(path, null, null,
                        $"no such file (dataset '{name}' of {study.Source.File}); is --data the right folder?");
                }
                DatasetFileScope.Check(path, folder, options.ReadableFolders);
                if (DatasetFiles.IsCsv(fileName) && !study.Data.Members.ContainsKey(name))
                {
                    opened[i] = CsvFileParts.Open(name, path, options);
                }
                else
                {
                    // XPT and Dataset-JSON files are read whole here, streamed, on this file's core.
                    var warnings = new List<string>();
                    outcomes[i] = (DatasetFiles.Read(name, path, options, warnings.Add, study.Data.Members.GetValueOrDefault(name)), warnings, null);
                }
            }
            catch (Exception e)
            {
                outcomes[i] = (null, [], e);
            }
        });
        var parts = opened.SelectMany((file, i) => file is null ? [] : Enumerable.Range(0, file.Count).Select(p => (File: i, Part: p)))
            .OrderByDescending(w => opened[w.File]!.BytesOf(w.Part))
            .ToList();
        // Each core takes the next largest part when it is free.
        InOrderParallel.For(parts.Count, w => opened[parts[w].File]!.Read(parts[w].Part));
        Parallel.For(0, files.Count, new ParallelOptions { MaxDegreeOfParallelism = Environment.ProcessorCount }, i =>
        {
            if (opened[i] is not { } file)
            {
                return;
            }
            var warnings = new List<string>();
            try
            {
                outcomes[i] = (file.Finish(warnings.Add), warnings, null);
            }
            catch (Exception e)
            {
                outcomes[i] = (null, warnings, e);
            }
        });
        var datasets = new Dictionary<string, Dataset>(StringComparer.Ordinal);
        for (var i = 0; i < files.Count; i++)
        {
            var (dataset, warnings, error) = outcomes[i];
            warnings.ForEach(warn);
            if (error is not null)
            {
                System.Runtime.ExceptionServices.ExceptionDispatchInfo.Capture(error).Throw();
            }
            datasets[files[i].Key] = dataset!;
        }
        var adsl = datasets["adsl"];
        AdamConformance.CheckSubjectLevel(adsl);
        foreach (var dataset in datasets.Values.Where(d => d.Name != "adsl"))
        {
            AdamConformance.CheckAgainstSubjectLevel(dataset, adsl);
        }
        return new StudyData(folder, datasets, unread);
    }
}
