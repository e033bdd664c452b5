using LiteDB;
using NodaTime;

namespace CanopyAdvisor.Storage.LiteDb;

/// <summary>The embedded store: one LiteDB 5 file opened in direct mode by this process alone.</summary>
/// <remarks>
/// <para><b>One instance per file.</b> Open it once at start and share it (a singleton); LiteDB's own locks make it
/// thread-safe inside one process. LiteDB's direct mode does not stop a second instance from opening the file (seen on
/// Linux), and two instances corrupt it, so this class holds an exclusive lock on <c>&lt;file&gt;.lock</c> while open: a
/// second instance, in this process or another on the same machine, fails with <see cref="StoreInUseException"/>. Never
/// put the file on a network share for several nodes (file locks there are not to be trusted).</para>
/// <para><b>Set-up.</b> The constructor builds this store's own <see cref="BsonMapper"/> (NodaTime <see cref="Instant"/>
/// as 100-ns ticks since the Unix epoch, an Int64, so it round-trips exactly) and ensures every index on the calling
/// thread, before any request can touch the database.</para>
/// <para><b>Queries</b> are materialised (<c>ToList</c>) inside each method, before any caller can <c>await</c>;
/// methods complete synchronously. <b>Writes</b> that touch several documents run in one LiteDB transaction.</para>
/// <para><b>Durability.</b> A committed write survives a crash of the process (LiteDB writes it to its log file before
/// the commit returns), but LiteDB 5 does not flush the operating system's cache to the disk (no fsync), so a power
/// cut or an operating-system crash may lose the last writes. Back up the data folder; use the PostgreSQL store
/// where that matters.</para>
/// </remarks>
public sealed class LiteDbCanopyStore : ICanopyStore
{
    private readonly FileStream _lockFile;
    private readonly LiteDatabase _db;
    private readonly Lock _disposeLock = new();
    private bool _disposed;

    /// <summary>Opens (or creates) the store file.</summary>
    /// <param name="path">The database file; its folder must exist.</param>
    /// <exception cref="StoreInUseException">Another instance, in this or another process, has the file open.</exception>
    public LiteDbCanopyStore(string path)
    {
        ArgumentException.ThrowIfNullOrEmpty(path);
        // Direct mode does not stop a second instance from opening the file, and two instances corrupt it: hold an
        // exclusive lock on a file beside it for as long as this instance is open (released by Dispose or process exit).
        string lockPath = path + ".lock";
        try
        {
            _lockFile = new FileStream(lockPath, FileMode.OpenOrCreate, FileAccess.ReadWrite, FileShare.None);
        }
        catch (IOException e)
        {
            throw new StoreInUseException($"The store {path} is already open in another instance or process (lock {lockPath}); run one service per data folder.", e);
        }

        var connection = new ConnectionString
        {
            Filename = path,
            Connection = ConnectionType.Direct,
        };
        try
        {
            _db = new LiteDatabase(connection, CreateMapper());
        }
        catch
        {
            _lockFile.Dispose();
            throw;
        }

        OrganisationCollection = _db.GetCollection<OrganisationDocument>("organisations");
        UserCollection = _db.GetCollection<UserDocument>("users");
        TokenCollection = _db.GetCollection<ApiTokenDocument>("apiTokens");
        SiteCollection = _db.GetCollection<SiteDocument>("sites");
        ForecastCollection = _db.GetCollection<ForecastDocument>("forecasts");
        JobRunCollection = _db.GetCollection<JobRunDocument>("jobRuns");
        ObservationCollection = _db.GetCollection<ObservationDocument>("observations");
        RotationDoneCollection = _db.GetCollection<RotationDoneDocument>("rotationsDone");
        CropVariantCollection = _db.GetCollection<CropVariantDocument>("cropVariants");

        UserCollection.EnsureIndex(u => u.Email, unique: true);
        UserCollection.EnsureIndex(u => u.OrganisationId);
        TokenCollection.EnsureIndex(t => t.TokenHash, unique: true);
        TokenCollection.EnsureIndex(t => t.UserId);
        SiteCollection.EnsureIndex(s => s.OrganisationSiteKey, unique: true);
        SiteCollection.EnsureIndex(s => s.OrganisationId);
        ForecastCollection.EnsureIndex(f => f.InputKey, unique: true);
        ForecastCollection.EnsureIndex(f => f.SiteId);
        JobRunCollection.EnsureIndex(j => j.SiteKind);
        JobRunCollection.EnsureIndex(j => j.SiteId);
        ObservationCollection.EnsureIndex(o => o.SiteId);
        RotationDoneCollection.EnsureIndex(r => r.SiteId);
        CropVariantCollection.EnsureIndex(v => v.OrganisationId);

        Organisations = new OrganisationRepository(this);
        Users = new UserRepository(this);
        ApiTokens = new ApiTokenRepository(this);
        Sites = new SiteRepository(this);
        Forecasts = new ForecastRepository(this);
        JobRuns = new JobRunRepository(this);
        Observations = new ObservationRepository(this);
        RotationsDone = new RotationDoneRepository(this);
        CropVariants = new CropVariantRepository(this);
    }

    /// <inheritdoc />
    public IOrganisationStore Organisations { get; }

    /// <inheritdoc />
    public IUserStore Users { get; }

    /// <inheritdoc />
    public IApiTokenStore ApiTokens { get; }

    /// <inheritdoc />
    public ISiteStore Sites { get; }

    /// <inheritdoc />
    public IForecastStore Forecasts { get; }

    /// <inheritdoc />
    public IJobRunStore JobRuns { get; }

    /// <inheritdoc />
    public IObservationStore Observations { get; }

    /// <inheritdoc />
    public IRotationDoneStore RotationsDone { get; }

    /// <inheritdoc />
    public ICropVariantStore CropVariants { get; }

    internal ILiteCollection<OrganisationDocument> OrganisationCollection { get; }

    internal ILiteCollection<UserDocument> UserCollection { get; }

    internal ILiteCollection<ApiTokenDocument> TokenCollection { get; }

    internal ILiteCollection<SiteDocument> SiteCollection { get; }

    internal ILiteCollection<ForecastDocument> ForecastCollection { get; }

    internal ILiteCollection<JobRunDocument> JobRunCollection { get; }

    internal ILiteCollection<ObservationDocument> ObservationCollection { get; }

    internal ILiteCollection<RotationDoneDocument> RotationDoneCollection { get; }

    internal ILiteCollection<CropVariantDocument> CropVariantCollection { get; }

    /// <inheritdoc />
    public Task<WriteOutcome> AddOrganisationAsync(
        OrganisationRecord organisation,
        IReadOnlyList<UserRecord> users,
        IReadOnlyList<SiteRecord> sites,
        CancellationToken cancellationToken = default)
    {
        ArgumentNullException.ThrowIfNull(organisation);
        ArgumentNullException.ThrowIfNull(users);
        ArgumentNullException.ThrowIfNull(sites);
        cancellationToken.ThrowIfCancellationRequested();
        if (users.Any(u => u.OrganisationId != organisation.Id) || sites.Any(s => s.OrganisationId != organisation.Id))
        {
            throw new ArgumentException("Every user and site must belong to the organisation added.", nameof(users));
        }

        return Task.FromResult(Write(() =>
        {
            OrganisationCollection.Insert(OrganisationDocument.From(organisation));
            UserCollection.InsertBulk(users.Select(UserDocument.From));
            SiteCollection.InsertBulk(sites.Select(SiteDocument.From));
            return WriteOutcome.Written;
        }));
    }

    /// <summary>Closes the database file (LiteDB writes its log into the data file first). Safe to call more than once
    /// and from several threads: the service closes the store when it stops and the container disposes it again.</summary>
    public void Dispose()
    {
        lock (_disposeLock)
        {
            if (_disposed)
            {
                return;
            }

            _disposed = true;
            _db.Dispose();
            _lockFile.Dispose();
        }
    }

    /// <summary>Runs a write in one transaction: committed when it returns <see cref="WriteOutcome.Written"/> (or any
    /// non-outcome value), rolled back when it returns another outcome or throws; a duplicate unique key rolls back
    /// and answers <see cref="WriteOutcome.KeyTaken"/>.</summary>
    internal WriteOutcome Write(Func<WriteOutcome> body)
    {
        if (!_db.BeginTrans())
        {
            throw new InvalidOperationException("A store transaction is already open on this thread.");
        }

        try
        {
            WriteOutcome outcome = body();
            if (outcome == WriteOutcome.Written)
            {
                _db.Commit();
            }
            else
            {
                _db.Rollback();
            }

            return outcome;
        }
        catch (LiteException e) when (e.ErrorCode == LiteException.INDEX_DUPLICATE_KEY)
        {
            _db.Rollback();
            return WriteOutcome.KeyTaken;
        }
        catch
        {
            _db.Rollback();
            throw;
        }
    }

    /// <summary>Runs a write that returns a value in one transaction (committed unless it throws).</summary>
    internal T Write<T>(Func<T> body)
    {
        if (!_db.BeginTrans())
        {
            throw new InvalidOperationException("A store transaction is already open on this thread.");
        }

        try
        {
            T result = body();
            _db.Commit();
            return result;
        }
        catch
        {
            _db.Rollback();
            throw;
        }
    }

    private static BsonMapper CreateMapper()
    {
        var mapper = new BsonMapper
        {
            EnumAsInteger = false,
            TrimWhitespace = false,
            EmptyStringToNull = false,
        };
        mapper.RegisterType(
            serialize: (Instant instant) => new BsonValue(instant.ToUnixTimeTicks()),
            deserialize: value => Instant.FromUnixTimeTicks(value.AsInt64));
        return mapper;
    }
}
