namespace CanopyAdvisor.Core.Plants;

/// <summary>The trade's groups of crops, as growers sort their ranges.</summary>
public enum CropGroup
{
    /// <summary>Bedding plants (annuals sold in packs and small pots).</summary>
    BeddingPlant,

    /// <summary>Flowering and foliage pot plants.</summary>
    PotPlant,

    /// <summary>Culinary herbs in pots.</summary>
    Herb,

    /// <summary>Vegetable transplants (young plants for planting out).</summary>
    VegetableTransplant,

    /// <summary>Microgreens grown in trays.</summary>
    Microgreen,
}
