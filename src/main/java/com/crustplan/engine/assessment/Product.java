package com.crustplan.engine.assessment;

import java.util.ArrayList;
import java.util.List;
import java.util.Optional;

import com.crustplan.engine.food.FoodCategory;
import com.crustplan.engine.food.Shape;
import com.crustplan.engine.input.InvalidInputException;

/**
 * What a surface is sold as, which decides its benchmark level. Where the regulation
 * tells products of one category apart (French fries and crisps are both potato) the
 * surface names its product by key; each category has a default.
 */
public enum Product {

	FRENCH_FRIES("french-fries", "French fries (chips)", FoodCategory.POTATO, BenchmarkLevel.FRENCH_FRIES, true),
	POTATO_CRISPS("crisps", "Potato crisps", FoodCategory.POTATO, BenchmarkLevel.POTATO_CRISPS, false),
	OTHER_POTATO("roast-potato", "Roast potatoes, rösti, wedges and other potato dishes", FoodCategory.POTATO, null,
			false),
	SOFT_BREAD_WHEAT("wheat-bread", "Soft bread, wheat-based", FoodCategory.BREAD, BenchmarkLevel.SOFT_BREAD_WHEAT,
			true),
	SOFT_BREAD_OTHER("other-bread", "Soft bread, not wheat-based (rye, mixed grain)", FoodCategory.BREAD,
			BenchmarkLevel.SOFT_BREAD_OTHER, false),
	CRISPBREAD("crispbread", "Crispbread", FoodCategory.BREAD, BenchmarkLevel.CRISPBREAD, false),
	CRACKERS("crackers", "Crackers (not potato-based)", FoodCategory.BREAD, BenchmarkLevel.CRACKERS, false),
	BISCUITS("biscuits", "Biscuits and wafers", FoodCategory.SWEET_DOUGH, BenchmarkLevel.BISCUITS_AND_WAFERS, true),
	GINGERBREAD("gingerbread", "Gingerbread", FoodCategory.SWEET_DOUGH, BenchmarkLevel.GINGERBREAD, false),
	SIMILAR_FINE_BAKERY("fine-bakery", "Other fine bakery wares like biscuits", FoodCategory.SWEET_DOUGH,
			BenchmarkLevel.SIMILAR_FINE_BAKERY, false),
	MEAT("meat", "Meat", FoodCategory.MEAT, null, true),
	POULTRY("poultry", "Poultry", FoodCategory.POULTRY_SKIN, null, true),
	FISH("fish", "Fish", FoodCategory.FISH, null, true),
	VEGETABLE("vegetable", "Vegetables", FoodCategory.VEGETABLE, null, true);

	private final String key;

	private final String label;

	private final FoodCategory category;

	private final BenchmarkLevel benchmark;

	private final boolean categoryDefault;

	Product(String key, String label, FoodCategory category, BenchmarkLevel benchmark, boolean categoryDefault) {
		this.key = key;
		this.label = label;
		this.category = category;
		this.benchmark = benchmark;
		this.categoryDefault = categoryDefault;
	}

	public String key() {
		return key;
	}

	public String label() {
		return label;
	}

	public FoodCategory category() {
		return category;
	}

	/**
	 * The shape a new surface sold as this starts from: crisps are slices, roast potatoes
	 * chunks (rösti and wedges are set by hand: slab, strip), otherwise the category's
	 * (common practice).
	 */
	public Shape usualShape() {
		return switch (this) {
			case POTATO_CRISPS -> Shape.SLAB;
			case OTHER_POTATO -> Shape.CUBE;
			default -> category.defaultShape();
		};
	}

	/** The Annex IV benchmark level, or empty where the regulation sets none. */
	public Optional<BenchmarkLevel> benchmark() {
		return Optional.ofNullable(benchmark);
	}

	/** Why there is no benchmark, for the page; empty when there is one. */
	public Optional<String> noBenchmarkReason() {
		if (benchmark != null) {
			return Optional.empty();
		}
		if (category == FoodCategory.POTATO) {
			return Optional
				.of("Regulation (EU) 2017/2158 sets benchmark levels for French fries and crisps only; roast potatoes, rösti and similar dishes have none. French fries (500 µg/kg) may serve as an orientation.");
		}
		return Optional.of("Regulation (EU) 2017/2158 sets no benchmark level for " + label.toLowerCase()
				+ ": acrylamide forms mainly in carbohydrate-rich foods such as potato and cereal products.");
	}

	/** The product a category stands for when the surface names none. */
	public static Product defaultFor(FoodCategory category) {
		for (Product p : values()) {
			if (p.category == category && p.categoryDefault) {
				return p;
			}
		}
		throw new IllegalStateException("no default product for " + category);
	}

	/** The products a surface of this category can be. */
	public static List<Product> of(FoodCategory category) {
		List<Product> list = new ArrayList<>();
		for (Product p : values()) {
			if (p.category == category) {
				list.add(p);
			}
		}
		return list;
	}

	/**
	 * The product with this key for the category; a null or blank key means the
	 * category's default.
	 * @throws InvalidInputException naming field {@code product} when the key is not a
	 * product of the category
	 */
	public static Product forSurface(FoodCategory category, String key) {
		if (key == null || key.isBlank()) {
			return defaultFor(category);
		}
		for (Product p : values()) {
			if (p.category == category
					&& (p.key.equalsIgnoreCase(key.trim()) || p.name().equalsIgnoreCase(key.trim()))) {
				return p;
			}
		}
		throw new InvalidInputException("product", "'" + key + "' is not a product of " + category.label()
				+ "; use one of " + of(category).stream().map(Product::key).toList());
	}

}
